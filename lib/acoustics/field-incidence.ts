/**
 * Field incidence over an open (extended-reaction) cavity, to a stated accuracy: every value
 * within 0.002 of an adaptive quadrature of the same integral (London 1950; Paris 1928):
 *   α_field = ∫0^θm α(θ) sin2θ dθ / sin²θm = ∫_{cosθm}^1 α(u)·2u du / sin²θm,  u = cosθ.
 *
 * Why a fixed rule is not enough: over an open cavity the phase of the wave reflected by the
 * cavity, 2·k·D·u, sweeps through whole turns as θ goes from 0 to θm, and each turn brings a
 * resonance of facing and cavity at some angle. Behind a heavy, lightly damped facing these
 * resonances are narrow (a thousandth of a radian), so a fixed 16-point rule either steps over
 * them or lands on one, and band values came out up to 0.024 wrong.
 *
 * What is done instead, at each frequency:
 * 1. A composite Gauss–Legendre rule in u, its panels spanning no more than PANEL_PHASE of the
 *    cavity's phase 2·k·D·u (D the whole cavity), so that neighbouring nodes are close in phase.
 *    Its cavity impedances depend on the cavity alone, so a cavity cache can keep them.
 * 2. Unless the facing is too light for any narrow dip (|r|/|s| < BROAD), the resonances are
 *    located between the nodes, and beyond the outermost ones, in terms of reflection
 *    coefficients. With R_c the
 *    cavity's reflection coefficient seen from the facing's back face at angle θ, and the facing
 *    as the Möbius map Zs = (A·Zb + B)/(C·Zb + D) (A = D = 1, C = 0, B = Zf when thin), the
 *    surface reflection is R = (q + p·R_c)/(s + r·R_c), with, in u-normalised terms,
 *    q = A + uB − C/u − D, p = A − uB − C/u + D, s = A + uB + C/u + D, r = A − uB + C/u − D.
 *    α = 1 − |R|² is sharp where |s + r·R_c| dips, i.e. where X = −r·R_c/s turns through arg 0;
 *    the dip's half-width in phase is (1 − |X|)/sqrt|X|.
 * 3. A dip narrower than RESOLVED node spacings is located (one secant step on arg X), and the
 *    base panel that holds it is rebuilt from pieces cut where the nearest dip changes, each
 *    integrated in τ with u = u_p ± g·sinh(τ), g the dip's half-width in u: nodes dense across
 *    the dip and spreading geometrically into its tails. The other panels keep their sums.
 * Where nothing is narrow, step 1 is the result: the fast path.
 */
import { type AngleRule, gaussLegendre } from "./incidence";
import type { FacingImpedance } from "./facing-impedance";

/** Gauss nodes per base panel. */
export const NODES_PER_PANEL = 8;
/** The most cavity phase, 2·k·D·Δu, one base panel spans (rad). */
export const PANEL_PHASE = 4;
/** A dip is resolved by the base rule when its half-width spans this many node spacings. */
export const RESOLVED = 2;
/**
 * Below this |r|/|s| (or |X| = |R_c|·|r/s| at every node, |X| varying smoothly with the angle)
 * no dip is narrower than about 1.3 rad of phase, (1 − m)/√m, which the base rule's nodes
 * (under 0.8 rad apart) resolve: the dips need not be looked for.
 */
export const BROAD = 0.3;

/** The composite rule in u = cosθ (ascending); weight = Gauss weight · 2u / sin²θm. */
export interface BaseRule extends AngleRule {
  readonly panels: number;
  /** 1/u */
  readonly inverse: Float64Array;
}

const rules = new Map<number, BaseRule>();
/** The same, by panel count, for one integrator's limit (no map lookup in the hot path). */
type RuleList = (BaseRule | undefined)[];

/** Panels for a cavity of depth D at wavenumber k: each spans at most PANEL_PHASE of 2·k·D·Δu. */
export function panelsFor(k: number, depth: number, maxAngleDeg: number): number {
  const span = 1 - Math.cos((maxAngleDeg * Math.PI) / 180);
  return Math.max(1, Math.ceil((2 * k * depth * span) / PANEL_PHASE));
}

export function baseRule(panels: number, maxAngleDeg: number): BaseRule {
  const key = panels * 1000 + maxAngleDeg;
  const hit = rules.get(key);
  if (hit) return hit;
  const max = (maxAngleDeg * Math.PI) / 180;
  const u0 = Math.cos(max);
  const norm = Math.sin(max) ** 2;
  const { x, w } = gaussLegendre(NODES_PER_PANEL);
  const n = panels * NODES_PER_PANEL;
  const cos = new Float64Array(n);
  const sin2 = new Float64Array(n);
  const weight = new Float64Array(n);
  const width = (1 - u0) / panels;
  for (let p = 0; p < panels; p++) {
    for (let i = 0; i < NODES_PER_PANEL; i++) {
      // gaussLegendre returns nodes from +1 down to −1: take them ascending
      const j = NODES_PER_PANEL - 1 - i;
      const u = u0 + width * (p + (1 + x[j]) / 2);
      const k = p * NODES_PER_PANEL + i;
      cos[k] = u;
      sin2[k] = 1 - u * u;
      weight[k] = ((width / 2) * w[j] * 2 * u) / norm;
    }
  }
  const rule: BaseRule = { panels, n, cos, sin2, weight, inverse: Float64Array.from(cos, (u) => 1 / u) };
  rules.set(key, rule);
  return rule;
}

/** Cavity impedances at given angles: the layered model, set to the frequency. */
export type CavityAt = (cos: Float64Array, sin2: Float64Array, n: number, re: Float64Array, im: Float64Array) => void;

const MAX_PIECE_NODES = 24;

/** Gauss–Legendre rules of 1 … MAX_PIECE_NODES points, made once. */
const LEGENDRE = Array.from({ length: MAX_PIECE_NODES + 1 }, (_, n) => gaussLegendre(Math.max(n, 1)));

/** Scratch arrays of n values. */
class Scratch {
  cos: Float64Array;
  sin2: Float64Array;
  re: Float64Array;
  im: Float64Array;
  w: Float64Array;
  constructor(n: number) {
    this.cos = new Float64Array(n);
    this.sin2 = new Float64Array(n);
    this.re = new Float64Array(n);
    this.im = new Float64Array(n);
    this.w = new Float64Array(n);
  }
}

/**
 * Field incidence over an open cavity at one frequency, from the cavity impedances at the base
 * rule's nodes (re, im from offset) behind a facing already set to the frequency.
 */
export class OpenCavityField {
  private readonly map = new FacingMap();
  private readonly one = new Scratch(1);
  private readonly piece_ = new Scratch(MAX_PIECE_NODES);
  /** Y, of the argument of X = −r·R_c/s, at each node */
  private yr = new Float64Array(64);
  private yi = new Float64Array(64);
  /** |ζu + 1|²·|s|² at each node: |X| = |Y| / it */
  private yd = new Float64Array(64);
  /** the maps' centres and half-widths in u, and whether each is too narrow for the base rule */
  private dipU = new Float64Array(16);
  private dipG = new Float64Array(16);
  private dipNarrow = new Uint8Array(16);
  private dips = 0;
  /** the base rule's integral panel by panel, and the panels to rebuild */
  private panelSum = new Float64Array(16);
  private marked = new Uint8Array(16);
  private readonly u0: number;
  private readonly norm: number;
  /** evaluations of the last call beyond the base rule (for the benchmark and the tests) */
  extra = 0;

  private readonly rules: RuleList = [];

  constructor(private readonly maxAngleDeg: number) {
    const max = (maxAngleDeg * Math.PI) / 180;
    this.u0 = Math.cos(max);
    this.norm = Math.sin(max) ** 2;
  }

  /** The base rule for a cavity of depth D at wavenumber k (its nodes depend on the cavity alone). */
  rule(k: number, depth: number): BaseRule {
    const panels = Math.max(1, Math.ceil((2 * k * depth * (1 - this.u0)) / PANEL_PHASE));
    return (this.rules[panels] ??= baseRule(panels, this.maxAngleDeg));
  }

  /**
   * `air`: for a cavity of air alone (no infill), its phase 2·k·D per unit of u; its reflection
   * coefficient is then exactly e^{−j·air·u}, and behind a thin (series) facing the dips are
   * found without looking at the nodes.
   */
  value(rule: BaseRule, re: Float64Array, im: Float64Array, offset: number, facing: FacingImpedance, cavityAt: CavityAt, air: number | null, phase: number): number {
    this.extra = 0;
    this.air = air;
    const { n, cos, weight } = rule;
    let sum = 0;
    const map = this.map;
    map.set(facing);
    if (map.lumped && !map.sharpDipsPossible(this.u0)) return facing.fieldSum(weight, cos, re, im, offset, 0, n);
    if (this.panelSum.length < rule.panels) this.panelSum = new Float64Array(rule.panels);
    if (air !== null && map.lumped) {
      for (let p = 0; p < rule.panels; p++) {
        const part = facing.fieldSum(weight, cos, re, im, offset, p * NODES_PER_PANEL, (p + 1) * NODES_PER_PANEL);
        this.panelSum[p] = part;
        sum += part;
      }
      return this.airDips(rule, air) ? this.rebuilt(rule.panels, cavityAt) : sum;
    }
    if (this.yr.length < n) {
      this.yr = new Float64Array(n);
      this.yi = new Float64Array(n);
      this.yd = new Float64Array(n);
    }
    sum = map.scan(rule, re, im, offset, this.panelSum, this.yr, this.yi, this.yd);
    // |X| = |R_c|·|r/s| below BROAD at every node: the cavity damps every dip broad
    if (map.largest < BROAD * BROAD) return sum;
    // nor can any dip be narrow whose least half-width (1 − m)/√m at the largest |X| met, over
    // the steepest arg X can turn (the cavity's phase bound `phase` plus the facing's own turn,
    // taken at three angles with a margin of 3), spans RESOLVED of the widest node gap
    // (the facing's turn only looked at when the cavity's phase alone would pass)
    const widest = (0.19 * (1 - this.u0)) / rule.panels;
    const least = halfWidth(Math.sqrt(map.largest));
    if (least >= RESOLVED * widest * phase && least >= RESOLVED * widest * (phase + 3 * map.phaseSlope(this.u0))) return sum;
    return this.findDips(rule, re, im, offset, cavityAt) ? this.rebuilt(rule.panels, cavityAt) : sum;
  }

  /**
   * The dips of an air-only cavity behind a thin facing, where R_c = e^{−j·air·u}: arg X =
   * ψ(u) − air·u with ψ = arg(−r/s) = arg(u·Zf/(2 + u·Zf)), which lies in [0, π/2) and varies
   * slowly, so the n-th dip solves air·u − ψ(u) = 2πn, found by Newton's method from the line
   * air·u = 2πn + ψ; its half-width in phase is (1 − m)/√m with m = |r/s| (|R_c| = 1). True when
   * one of them is too narrow for the base rule.
   */
  private airDips(rule: BaseRule, air: number): boolean {
    const { n, cos } = rule;
    this.dips = 0;
    // no dip can be narrower than the least half-width (1 − m)/√m at the largest m = |r/s|, at
    // u = 1, over the largest slope air + 2·Im Zf/|2 + u·Zf|² ≤ air + Im Zf/2: if that already
    // spans RESOLVED of the widest node gap (0.19 of a panel for 8 Gauss points), none is narrow
    const widest = (0.19 * (1 - this.u0)) / rule.panels;
    if (halfWidth(this.map.ratio(1)) / (air + Math.max(0, this.map.facing.bi) / 2) >= RESOLVED * widest) return false;
    let narrow = false;
    this.zfPhase = Math.atan2(this.map.facing.bi, this.map.facing.br);
    const middle = this.facingPhase(0.5 * (this.u0 + 1));
    // ψ lies within π/2 of its middle value: the dips within half a turn of the range
    const first = Math.ceil((air * this.u0 - middle - 0.5 * Math.PI) / (2 * Math.PI) - 0.5);
    const last = Math.floor((air - middle + 0.5 * Math.PI) / (2 * Math.PI) + 0.5);
    for (let k = first; k <= last; k++) {
      let u = (2 * Math.PI * k + middle) / air;
      let slope = air;
      // ψ changes by less than π/2 over the range, and slowly: two Newton steps from the line
      for (let iter = 0; iter < 2; iter++) {
        slope = air - this.facingPhaseSlope(u);
        u -= (air * u - this.facingPhase(u) - 2 * Math.PI * k) / slope;
      }
      const g = halfWidth(this.map.ratio(u)) / Math.abs(slope);
      if (u >= this.u0 && u <= 1) {
        // the node spacing around u
        let j = 0;
        while (j + 1 < n && cos[j + 1] < u) j++;
        const spacing = j + 1 < n ? cos[j + 1] - cos[j] : cos[n - 1] - cos[n - 2];
        narrow = this.push(u, g, g < RESOLVED * Math.max(spacing, cos[0] - this.u0)) || narrow;
      } else {
        // beyond an end: its tail reaches in if it is near
        const end = u < this.u0 ? this.u0 : 1;
        const spacing = u < this.u0 ? cos[0] - this.u0 : 1 - cos[n - 1];
        const reach = Math.abs(u - end) + g;
        if (reach < RESOLVED * Math.max(spacing, cos[1] - cos[0])) narrow = this.push(end, reach, true) || narrow;
      }
    }
    return narrow;
  }

  /** arg Zf of the current frequency */
  private zfPhase = 0;

  /** ψ(u) = arg(−r/s) = arg(u·Zf/(2 + u·Zf)) = arg Zf − arg(2 + u·Zf) of a thin facing. */
  private facingPhase(u: number): number {
    return this.zfPhase - Math.atan2(u * this.map.facing.bi, 2 + u * this.map.facing.br);
  }

  /** dψ/du = −2·Im Zf / |2 + u·Zf|². */
  private facingPhaseSlope(u: number): number {
    const { br, bi } = this.map.facing;
    const dr = 2 + u * br;
    const di = u * bi;
    return (-2 * bi) / (dr * dr + di * di);
  }

  /** Locate every dip from Y at the nodes; true when one of them is too narrow for the base rule. */
  private findDips(rule: BaseRule, re: Float64Array, im: Float64Array, offset: number, cavityAt: CavityAt): boolean {
    const { n, cos } = rule;
    this.dips = 0;
    let narrow = false;
    // between an end and the outermost node, or just beyond the end: extrapolated from the two outermost nodes
    if (n > 1) narrow = this.endDip(cos, 0, 1, this.u0) || narrow;
    for (let i = 0; i + 1 < n; i++) {
      // arg X crosses 0 where Im X changes sign on the side Re X > 0 (on the other, ±π, |s + r R_c| is largest)
      if ((this.yi[i] > 0) === (this.yi[i + 1] > 0) || (this.yr[i] <= 0 && this.yr[i + 1] <= 0)) continue;
      const a = Math.atan2(this.yi[i], this.yr[i]);
      const b = Math.atan2(this.yi[i + 1], this.yr[i + 1]);
      if (Math.abs(a - b) >= Math.PI) continue;
      narrow = this.crossing(cos, i, a, b, cavityAt) || narrow;
    }
    if (n > 1) narrow = this.endDip(cos, n - 1, n - 2, 1) || narrow;
    return narrow;
  }

  /** |X| at node i of the last scan. */
  private nodeX(i: number): number {
    return Math.sqrt(this.yr[i] * this.yr[i] + this.yi[i] * this.yi[i]) / this.yd[i];
  }

  /**
   * A crossing of arg X = 0 between nodes i and i + 1 (arg X = a, b there): one secant step,
   * then the dip's centre and half-width.
   */
  private crossing(cos: Float64Array, i: number, a: number, b: number, cavityAt: CavityAt): boolean {
    const ua = cos[i];
    const ub = cos[i + 1];
    let u = ua + ((ub - ua) * a) / (a - b);
    // a dip clearly broad by the nodes' own |X| (the larger, the narrower) and the chord's slope
    // needs no closer look: with a margin of half as much again for the slope at the crossing
    const rough = (halfWidth(Math.max(this.nodeX(i), this.nodeX(i + 1))) * (ub - ua)) / Math.abs(a - b);
    if (rough >= 1.5 * RESOLVED * (ub - ua)) return this.push(u, rough, false);
    const one = this.one;
    one.cos[0] = u;
    one.sin2[0] = 1 - u * u;
    this.cavity(one, 1, cavityAt);
    const x = X_SCRATCH;
    this.map.variable(one.re[0], one.im[0], u, x);
    const p = Math.atan2(x.im, x.re);
    const same = (p > 0) === (a > 0);
    const slope = ((same ? b : a) - p) / ((same ? ub : ua) - u);
    if (slope !== 0 && Number.isFinite(slope)) u -= p / slope;
    if (!(u > ua && u < ub)) u = Math.min(ub, Math.max(ua, u));
    const g = halfWidth(Math.sqrt(x.re * x.re + x.im * x.im)) / Math.max(Math.abs(slope), 1e-12);
    return this.push(u, g, g < RESOLVED * (ub - ua));
  }

  /**
   * A dip between the outermost node and the end of the range, or beyond the end: arg X
   * extrapolated from the two outermost nodes crosses 0 outside them. Its map is centred on the
   * crossing if it lies within the range, else on the end, with the scale of distance plus
   * half-width.
   */
  private endDip(cos: Float64Array, outer: number, inner: number, end: number): boolean {
    // arg X within ±π/2 at both nodes (Re X > 0), and tan(arg X) heading for 0 beyond the outer node
    if (this.yr[outer] <= 0 || this.yr[inner] <= 0) return false;
    const to = this.yi[outer] / this.yr[outer];
    const ti = this.yi[inner] / this.yr[inner];
    if (to === ti || (to > 0) !== (ti > 0) || Math.abs(to) >= Math.abs(ti)) return false;
    const p = Math.atan2(this.yi[outer], this.yr[outer]);
    const q = Math.atan2(this.yi[inner], this.yr[inner]);
    const span = cos[inner] - cos[outer];
    const slope = (q - p) / span;
    if (Math.abs(q - p) >= Math.PI || Math.abs(p) >= Math.PI / 2 || !(slope !== 0 && Number.isFinite(slope))) return false;
    const crossing = cos[outer] - p / slope;
    // the extrapolated crossing must lie on the far side of the outer node
    if ((crossing > cos[outer]) === (span > 0)) return false;
    const width = halfWidth(this.nodeX(outer)) / Math.abs(slope);
    const inside = span > 0 ? crossing > end : crossing < end;
    const g = inside ? width : Math.abs(crossing - end) + width;
    return this.push(inside ? crossing : end, g, g < RESOLVED * Math.abs(span));
  }

  /** the cavity's phase per unit of u when it is air alone, else null (of the current call) */
  private air: number | null = null;

  /**
   * Cavity impedances at the scratch's n angles: of air alone on the backing, −j·cot(k·D·u)/u
   * in closed form (the layered model's back layer, without a call into it); else the model's.
   */
  private cavity(s: Scratch, n: number, cavityAt: CavityAt): void {
    this.extra += n;
    const air = this.air;
    if (air === null) {
      cavityAt(s.cos, s.sin2, n, s.re, s.im);
      return;
    }
    airCavity(air, s.cos, n, s.re, s.im, 0);
  }

  /** Record a dip (in ascending u); returns whether it is narrow. */
  private push(u: number, g: number, narrow: boolean): boolean {
    if (this.dips === this.dipU.length) this.grow();
    this.dipU[this.dips] = u;
    this.dipG[this.dips] = g;
    this.dipNarrow[this.dips] = narrow ? 1 : 0;
    this.dips++;
    return narrow;
  }

  private grow(): void {
    const u = new Float64Array(2 * this.dipU.length);
    const g = new Float64Array(2 * this.dipU.length);
    const narrow = new Uint8Array(2 * this.dipU.length);
    u.set(this.dipU);
    g.set(this.dipG);
    narrow.set(this.dipNarrow);
    this.dipU = u;
    this.dipG = g;
    this.dipNarrow = narrow;
  }

  /**
   * The integral with every base panel that holds a narrow dip, or lies within a quarter panel
   * of one, rebuilt from pieces in the sinh variable of the nearest dip; the other panels keep
   * the base rule's sums.
   */
  private rebuilt(panels: number, cavityAt: CavityAt): number {
    const width = (1 - this.u0) / panels;
    if (this.marked.length < panels) this.marked = new Uint8Array(panels);
    const marked = this.marked;
    marked.fill(0, 0, panels);
    for (let d = 0; d < this.dips; d++) {
      if (!this.dipNarrow[d]) continue;
      const c = this.dipU[d];
      const p = Math.min(panels - 1, Math.max(0, Math.floor((c - this.u0) / width)));
      marked[p] = 1;
      if (p > 0 && c - (this.u0 + p * width) < 0.25 * width) marked[p - 1] = 1;
      if (p < panels - 1 && this.u0 + (p + 1) * width - c < 0.25 * width) marked[p + 1] = 1;
    }
    let sum = 0;
    for (let p = 0; p < panels; p++) {
      if (!marked[p]) {
        sum += this.panelSum[p];
        continue;
      }
      const a = this.u0 + p * width;
      const b = p === panels - 1 ? 1 : a + width;
      sum += this.panel(a, b, cavityAt);
    }
    return sum;
  }

  /** ∫ over [a, b], cut where the nearest dip changes, each cut in that dip's sinh variable. */
  private panel(a: number, b: number, cavityAt: CavityAt): number {
    const { dipU, dipG } = this;
    // the dip nearest to a, then each boundary between the cells of consecutive dips
    let d = 0;
    while (d + 1 < this.dips && Math.abs(dipU[d + 1] - a) < Math.abs(dipU[d] - a)) d++;
    let start = a;
    let sum = 0;
    for (;;) {
      const next = d + 1 < this.dips ? 0.5 * (dipU[d] + dipU[d + 1]) : Infinity;
      const end = Math.min(b, next);
      const c = dipU[d];
      if (c > start && c < end) sum += this.piece(c, dipG[d], start, c, cavityAt) + this.piece(c, dipG[d], c, end, cavityAt);
      else sum += this.piece(c, dipG[d], start, end, cavityAt);
      if (end >= b) return sum;
      start = end;
      d++;
    }
  }

  /**
   * ∫ α 2u du / sin²θm over [from, to], both on one side of the dip at `centre`, with
   * u = centre ± g·sinh(τ): dense across the dip, geometric into its tail.
   */
  private piece(centre: number, g: number, from: number, to: number, cavityAt: CavityAt): number {
    if (to <= from) return 0;
    const sign = from + to > 2 * centre ? 1 : -1;
    const t1 = Math.asinh(Math.abs(from - centre) / g);
    const t2 = Math.asinh(Math.abs(to - centre) / g);
    const lo = Math.min(t1, t2);
    const span = Math.abs(t2 - t1);
    const count = Math.min(MAX_PIECE_NODES, 3 + Math.ceil(1.2 * span));
    const { x, w } = LEGENDRE[count];
    const pc = this.piece_;
    for (let i = 0; i < count; i++) {
      const e = Math.exp(lo + (span * (1 + x[i])) / 2);
      const u = centre + sign * g * 0.5 * (e - 1 / e);
      pc.cos[i] = u;
      pc.sin2[i] = 1 - u * u;
      // du/dτ = g·cosh τ
      pc.w[i] = ((span / 2) * w[i] * g * 0.5 * (e + 1 / e) * 2 * u) / this.norm;
    }
    this.cavity(pc, count, cavityAt);
    return this.map.facing.fieldSum(pc.w, pc.cos, pc.re, pc.im, 0, 0, count);
  }
}

const shared = new Map<number, OpenCavityField>();

/**
 * The integrator for a field-incidence limit. Its scratch arrays are shared: the engine is
 * synchronous and an integration never calls another, so one instance serves every evaluation.
 */
export function openCavityField(maxAngleDeg: number): OpenCavityField {
  let field = shared.get(maxAngleDeg);
  if (!field) {
    field = new OpenCavityField(maxAngleDeg);
    shared.set(maxAngleDeg, field);
  }
  return field;
}

/**
 * The facing at one frequency as plain numbers, Zs = (A·Zb + B)/(C·Zb + A) (a thin facing:
 * A = 1, B = Zf, C = 0), so that the loops over angles read locals, not the facing's object.
 */
class FacingMap {
  lumped = true;
  /** the facing, set to the frequency: its A, B, C */
  private f!: FacingImpedance;

  get facing(): FacingImpedance {
    return this.f;
  }
  // r and s of the last `terms(u)`: s = 2A + uB + C/u, r = −uB + C/u
  rr = 0;
  ri = 0;
  sr = 0;
  si = 0;

  set(facing: FacingImpedance): void {
    this.f = facing;
    this.lumped = facing.model === "lumped";
  }

  /**
   * One pass over the base rule's nodes, all the dip search reads: Σ weight·α panel by panel
   * (into panelSum, the total returned), the largest |X|² = |R_c|²·|r/s|² met (into `largest`,
   * compared without a division), Y, of the argument of X (into yr, yi), and |ζu + 1|²·|s|²,
   * by which |X| = |Y| / it (into yd).
   */
  scan(rule: BaseRule, re: Float64Array, im: Float64Array, offset: number, panelSum: Float64Array, yr: Float64Array, yi: Float64Array, yd: Float64Array): number {
    const { ar, ai, br, bi, cr, ci } = this.f;
    const lumped = this.lumped;
    const { panels, cos, weight, inverse } = rule;
    let total = 0;
    let most = 0;
    for (let p = 0, i = 0; p < panels; p++) {
      let part = 0;
      for (const end = i + NODES_PER_PANEL; i < end; i++) {
        const zr = re[offset + i];
        const zi = im[offset + i];
        const u = cos[i];
        if (lumped) {
          const a = (zr + br) * u;
          const b = (zi + bi) * u;
          part += (weight[i] * 4 * a) / ((a + 1) * (a + 1) + b * b);
        } else {
          // Zs = N/D: α = 4u·Re(N·conj D)/|N·u + D|², one division
          const nr = ar * zr - ai * zi + br;
          const ni = ar * zi + ai * zr + bi;
          const dr = cr * zr - ci * zi + ar;
          const di = cr * zi + ci * zr + ai;
          const er = nr * u + dr;
          const ei = ni * u + di;
          part += (weight[i] * 4 * u * (nr * dr + ni * di)) / (er * er + ei * ei);
        }
        // r = −uB + C/u, s = 2A + uB + C/u (A = D)
        const cu = cr * inverse[i];
        const ciu = ci * inverse[i];
        const rr = -u * br + cu;
        const ri = -u * bi + ciu;
        const sr = 2 * ar + u * br + cu;
        const si = 2 * ai + u * bi + ciu;
        // |X|² = |ζu − 1|²·|r|² / (|ζu + 1|²·|s|²), R_c = (ζu − 1)/(ζu + 1)
        const xr = zr * u;
        const xi = zi * u;
        const num = ((xr - 1) * (xr - 1) + xi * xi) * (rr * rr + ri * ri);
        const den = ((xr + 1) * (xr + 1) + xi * xi) * (sr * sr + si * si);
        if (num > most * den) most = num / den;
        yd[i] = den;
        // Y = −r·(ζu − 1)·conj(ζu + 1)·conj(s)
        const pr = (xr - 1) * (xr + 1) + xi * xi;
        const pi = 2 * xi;
        const tr = -(rr * pr - ri * pi);
        const ti = -(rr * pi + ri * pr);
        yr[i] = tr * sr + ti * si;
        yi[i] = ti * sr - tr * si;
      }
      panelSum[p] = part;
      total += part;
    }
    this.largest = most;
    return total;
  }

  /** the largest |X|² met by the last scan */
  largest = 0;

  terms(u: number, inverse: number): void {
    if (this.lumped) {
      this.rr = -u * this.f.br;
      this.ri = -u * this.f.bi;
      this.sr = 2 - this.rr;
      this.si = -this.ri;
      return;
    }
    const cr = this.f.cr * inverse;
    const ci = this.f.ci * inverse;
    this.rr = -u * this.f.br + cr;
    this.ri = -u * this.f.bi + ci;
    this.sr = 2 * this.f.ar + u * this.f.br + cr;
    this.si = 2 * this.f.ai + u * this.f.bi + ci;
  }

  /**
   * The largest |dψ/du| of ψ = arg(−r/s) at u0, the middle and 1, from ψ' = Im(r'/r − s'/s) with
   * r' = −B − C/u², s' = B − C/u².
   */
  phaseSlope(u0: number): number {
    let most = 0;
    for (let k = 0; k < 3; k++) {
      const u = k === 0 ? u0 : k === 1 ? 0.5 * (u0 + 1) : 1;
      this.terms(u, 1 / u);
      const c2r = this.f.cr / (u * u);
      const c2i = this.f.ci / (u * u);
      // r'/r and s'/s
      const dr1 = -this.f.br - c2r;
      const di1 = -this.f.bi - c2i;
      const dr2 = this.f.br - c2r;
      const di2 = this.f.bi - c2i;
      const nr = this.rr * this.rr + this.ri * this.ri;
      const ns = this.sr * this.sr + this.si * this.si;
      const im1 = (di1 * this.rr - dr1 * this.ri) / nr;
      const im2 = (di2 * this.sr - dr2 * this.si) / ns;
      most = Math.max(most, Math.abs(im1 - im2));
    }
    return most;
  }

  /** |r|/|s| at u: |X| cannot exceed it. */
  ratio(u: number): number {
    this.terms(u, 1 / u);
    return Math.sqrt((this.rr * this.rr + this.ri * this.ri) / (this.sr * this.sr + this.si * this.si));
  }

  /**
   * Whether a dip can be narrow: |r|/|s| above BROAD at either end or the middle of the range,
   * where r/s varies smoothly (for a thin facing it only grows with u).
   */
  sharpDipsPossible(u0: number): boolean {
    if (this.lumped) return this.ratio(1) > BROAD;
    return this.ratio(1) > BROAD || this.ratio(u0) > BROAD || this.ratio(0.5 * (u0 + 1)) > BROAD;
  }

  /**
   * Y = −r·(ζu − 1)·conj(ζu + 1)·conj(s): X = −r·R_c/s times the positive |ζu + 1|²·|s|², so of
   * the same argument, without a division.
   */
  direction(zr: number, zi: number, u: number, inverse: number, out: { re: number; im: number }): void {
    const cr = zr * u;
    const ci = zi * u;
    // (ζu − 1)·conj(ζu + 1) = (cr − 1 + j ci)(cr + 1 − j ci)
    const pr = (cr - 1) * (cr + 1) + ci * ci;
    const pi = ci * (cr + 1) - (cr - 1) * ci;
    this.terms(u, inverse);
    const qr = -(this.rr * pr - this.ri * pi);
    const qi = -(this.rr * pi + this.ri * pr);
    out.re = qr * this.sr + qi * this.si;
    out.im = qi * this.sr - qr * this.si;
  }

  /** X = −r·R_c/s at angle u for a cavity of impedance zr + j zi. */
  variable(zr: number, zi: number, u: number, out: { re: number; im: number }): void {
    this.direction(zr, zi, u, 1 / u, out);
    const cr = zr * u;
    const ci = zi * u;
    const scale = 1 / (((cr + 1) * (cr + 1) + ci * ci) * (this.sr * this.sr + this.si * this.si));
    out.re *= scale;
    out.im *= scale;
  }
}

const X_SCRATCH = { re: 0, im: 0 };

/**
 * Normalised impedances of a cavity of air alone on a rigid backing at n angles (cosines u):
 * −j·cot(k·D·u)/u, `air` = 2·k·D; into re, im from offset. The layered model's back layer in
 * closed form, for the open-cavity rule's hot path.
 */
export function airCavity(air: number, cos: Float64Array, n: number, re: Float64Array, im: Float64Array, offset: number): void {
  for (let i = 0; i < n; i++) {
    const u = cos[i];
    const t = Math.tan(0.5 * air * u);
    re[offset + i] = 0;
    im[offset + i] = -1 / (u * (Math.abs(t) < 1e-12 ? 1e-12 : t));
  }
}

/** Half-width in phase of the dip of |1 − X|² where |X| = m < 1: (1 − m)/sqrt(m). */
function halfWidth(m: number): number {
  return m >= 1 ? 1e-9 : (1 - m) / Math.sqrt(Math.max(m, 1e-12));
}
