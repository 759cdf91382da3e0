/**
 * An independent route to a thick perforated facing, for the tests: the holes as Crandall's
 * tube (Crandall, Theory of Vibrating Systems and Sound, 1926; as given by Maa, JASA 104(5),
 * 1998, and Allard & Atalla, Propagation of Sound in Porous Media, 2009):
 *   ρ_eff = ρ0 / (1 − 2 J1(κ)/(κ J0(κ))),  κ = a·sqrt(−jωρ0/η)
 * with the ratio J1/J0 by its continued fraction (Gauss; J_ν/J_{ν−1} = 1/(2ν/z − J_{ν+1}/J_ν)),
 * evaluated with mathjs complex numbers; bulk modulus ρ0c² (adiabatic); full 2×2 matrices:
 * half the end impedance, the layer of porosity ε, the other half, then the air cavity on a
 * rigid backing. Nothing here is taken from the engine but the air's properties.
 */
import { type Complex, add, complex, cos, divide, multiply, sin, sqrt, subtract } from "mathjs";
import type { Air } from "@/lib/acoustics/air";

type C = Complex;
const ONE = complex(1, 0);
const J = complex(0, 1);

/** J1(z)/J0(z) by the continued fraction, summed backwards from depth n. */
export function besselRatio(z: C, depth = 600): C {
  // r_ν = J_ν/J_{ν−1} = 1/(2ν/z − r_{ν+1}); start from r_{depth+1} = 0
  let r: C = complex(0, 0);
  for (let nu = depth; nu >= 1; nu--) r = divide(ONE, subtract(divide(complex(2 * nu, 0), z), r)) as C;
  return r;
}

/** Crandall's ρ_eff/ρ0 in a tube of radius a. */
export function crandallDensity(radius: number, f: number, air: Air): C {
  const w = 2 * Math.PI * f;
  const kappa = multiply(radius, sqrt(complex(0, (-w * air.rho) / air.eta))) as C;
  const ratio = besselRatio(kappa);
  return divide(ONE, subtract(ONE, divide(multiply(2, ratio), kappa))) as C;
}

export interface ThickPlate {
  holeDiameter: number;
  thickness: number;
  openArea: number;
  /** total end correction 2δ, m */
  endCorrection: number;
  /** end resistance in units of R_s/ε */
  endResistance: number;
}

/** Normal-incidence absorption of a thick plate over an air cavity of depth D. */
export function thickPlateAlpha(plate: ThickPlate, depth: number, f: number, air: Air): number {
  const w = 2 * Math.PI * f;
  const k0 = w / air.c;
  const eps = plate.openArea;
  const rho = crandallDensity(plate.holeDiameter / 2, f, air);
  const root = sqrt(rho) as C;
  const zh = divide(root, eps) as C;
  const kt = multiply(root, k0 * plate.thickness) as C;
  const rs = 0.5 * Math.sqrt(2 * air.eta * w * air.rho);
  const half = complex((plate.endResistance * rs) / (2 * eps * air.z0), (k0 * plate.endCorrection) / (2 * eps));
  type M = [C, C, C, C];
  const mul = (A: M, B: M): M => [
    add(multiply(A[0], B[0]), multiply(A[1], B[2])) as C,
    add(multiply(A[0], B[1]), multiply(A[1], B[3])) as C,
    add(multiply(A[2], B[0]), multiply(A[3], B[2])) as C,
    add(multiply(A[2], B[1]), multiply(A[3], B[3])) as C,
  ];
  const ends: M = [ONE, half, complex(0, 0), ONE];
  const layer: M = [cos(kt), multiply(J, multiply(zh, sin(kt))) as C, divide(multiply(J, sin(kt)), zh) as C, cos(kt)];
  const cavity: M = [complex(Math.cos(k0 * depth), 0), complex(0, Math.sin(k0 * depth)), complex(0, Math.sin(k0 * depth)), complex(Math.cos(k0 * depth), 0)];
  const T = mul(mul(mul(ends, layer), ends), cavity);
  const z = divide(T[0], T[2]) as C;
  const r = divide(subtract(z, ONE), add(z, ONE)) as C;
  return 1 - (r.re * r.re + r.im * r.im);
}
