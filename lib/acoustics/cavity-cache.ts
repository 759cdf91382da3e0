/**
 * The cavity's impedance does not depend on the facing: the facing only maps the cavity's Zb to
 * the surface's Zs, at every frequency and angle. A sweep over hole patterns (the design
 * assistant) or a slider on the facing (the tuning bench) can therefore keep the cavity's table
 * and only apply the facing; and as a sweep tries each hole pattern over many cavities, the
 * facing's own values per frequency are kept too. The cache is explicit, passed in
 * EvaluateOptions; without it every evaluation is computed anew.
 */
import type { Air } from "./air";
import type { Cavity, Facing, Infill } from "./build-up";
import { FACING_STATE as STATE, type FacingImpedance } from "./facing-impedance";

/** a local copy: an imported binding is read through a getter in some module loaders */
const FACING_STATE = STATE;
import { locallyReactingField, obliqueAbsorption } from "./incidence";
import type { LayeredModel } from "./layered-model";
import { OpenFieldRunner, type SpectrumGrid } from "./spectrum";

export interface CavityTable {
  normalRe: Float64Array;
  normalIm: Float64Array;
  /** open cavity: per frequency, the base rule's angles from fieldOffset[k]; empty when locally reacting */
  fieldRe: Float64Array;
  fieldIm: Float64Array;
  fieldOffset: Int32Array;
}

export function cavityTable(model: LayeredModel, grid: SpectrumGrid): CavityTable {
  const { frequencies, q } = grid;
  const nf = frequencies.length;
  const open = grid.locallyReacting ? null : new OpenFieldRunner(model, q.maxAngleDeg);
  const fieldOffset = new Int32Array(nf + 1);
  for (let k = 0; k < nf; k++) fieldOffset[k + 1] = fieldOffset[k] + (open ? (grid.adaptive ? open.rule(frequencies[k]).n : q.n) : 0);
  const table: CavityTable = {
    normalRe: new Float64Array(nf),
    normalIm: new Float64Array(nf),
    fieldRe: new Float64Array(fieldOffset[nf]),
    fieldIm: new Float64Array(fieldOffset[nf]),
    fieldOffset,
  };
  for (let k = 0; k < nf; k++) {
    model.setFrequency(frequencies[k]);
    model.impedance();
    table.normalRe[k] = model.cavityRe;
    table.normalIm[k] = model.cavityIm;
    if (!open) continue;
    const nodes = grid.adaptive ? open.rule(frequencies[k]) : q;
    model.cavityImpedances(nodes.cos, nodes.sin2, nodes.n, table.fieldRe, table.fieldIm, fieldOffset[k]);
  }
  return table;
}

/** The facing's state at every frequency of the grid. */
export function facingTable(facing: FacingImpedance, grid: SpectrumGrid): Float64Array {
  const out = new Float64Array(FACING_STATE * grid.frequencies.length);
  for (let k = 0; k < grid.frequencies.length; k++) {
    facing.at(grid.frequencies[k]);
    facing.save(out, FACING_STATE * k);
  }
  return out;
}

/**
 * Normal and field-incidence absorption from a cavity table and the model of the same cavity
 * with its facing (its state per frequency from a facing table when given).
 */
export function fillFromTable(model: LayeredModel, table: CavityTable, grid: SpectrumGrid, facingStates?: Float64Array): void {
  const { frequencies, q, normal, diffuse } = grid;
  const facing = model.facing;
  const open = grid.locallyReacting ? null : new OpenFieldRunner(model, q.maxAngleDeg);
  for (let k = 0; k < frequencies.length; k++) {
    if (facingStates) facing.restore(facingStates, FACING_STATE * k);
    else facing.at(frequencies[k]);
    facing.surface(table.normalRe[k], table.normalIm[k]);
    const zr = facing.sr;
    const zi = facing.si;
    normal[k] = obliqueAbsorption(zr, zi, 1);
    if (!open) diffuse[k] = locallyReactingField(zr, zi, q);
    else if (grid.adaptive) diffuse[k] = open.fromTable(frequencies[k], table.fieldRe, table.fieldIm, table.fieldOffset[k]);
    else diffuse[k] = facing.fieldSum(q.weight, q.cos, table.fieldRe, table.fieldIm, table.fieldOffset[k], 0, q.n);
  }
}

function sameFacing(a: Facing, b: Facing): boolean {
  if (a.kind !== b.kind || a.thickness !== b.thickness) return false;
  if (a.kind === "slots") return b.kind === "slots" && a.slotWidth === b.slotWidth && a.slotPitch === b.slotPitch;
  return b.kind !== "slots" && a.holeDiameter === b.holeDiameter && a.pitch === b.pitch && a.grid === b.grid;
}

function sameInfill(a: Infill | null, b: Infill | null): boolean {
  if (a === null || b === null) return a === b;
  return a.thickness === b.thickness && a.flowResistivity === b.flowResistivity && a.position === b.position && a.model === b.model;
}

interface CavityKey {
  cavity: Cavity;
  infill: Infill | null;
}

function sameCavity(a: CavityKey, b: CavityKey): boolean {
  return a.cavity.depth === b.cavity.depth && a.cavity.partitioned === b.cavity.partitioned && sameInfill(a.infill, b.infill);
}

/** What a table was made for: compared field by field, not through a string. */
interface Key<T> {
  of: T;
  c: number;
  rho: number;
  eta: number;
  grid: SpectrumGrid;
}

/**
 * At most `limit` tables, the newest first and the oldest dropped; looked up by comparing the
 * numbers they were made for (a sweep's few dozen cavities and facings: a short scan, cheaper
 * than writing each key out as a string).
 */
class Recent<T, V> {
  private readonly keys: Key<T>[] = [];
  private readonly values: V[] = [];

  constructor(
    private readonly limit: number,
    private readonly same: (a: T, b: T) => boolean,
    private readonly copy: (of: T) => T,
  ) {}

  get(of: T, air: Air, grid: SpectrumGrid, build: () => V): V {
    for (let i = 0; i < this.keys.length; i++) {
      const key = this.keys[i];
      if (
        key.c === air.c &&
        key.rho === air.rho &&
        key.eta === air.eta &&
        key.grid.frequencies === grid.frequencies &&
        key.grid.q === grid.q &&
        key.grid.adaptive === grid.adaptive &&
        key.grid.locallyReacting === grid.locallyReacting &&
        this.same(key.of, of)
      ) {
        return this.values[i];
      }
    }
    const value = build();
    // a copy: the caller may change its object afterwards
    this.keys.unshift({ of: this.copy(of), c: air.c, rho: air.rho, eta: air.eta, grid });
    this.values.unshift(value);
    if (this.keys.length > this.limit) {
      this.keys.pop();
      this.values.pop();
    }
    return value;
  }
}

export class CavityCache {
  private readonly tables: Recent<CavityKey, CavityTable>;
  private readonly facings: Recent<Facing, Float64Array>;

  constructor(limit = 64) {
    this.tables = new Recent(limit, sameCavity, ({ cavity, infill }) => ({ cavity: { ...cavity }, infill: infill && { ...infill } }));
    this.facings = new Recent(limit, sameFacing, (facing) => ({ ...facing }));
  }

  facing(facing: Facing, air: Air, grid: SpectrumGrid, build: () => Float64Array): Float64Array {
    return this.facings.get(facing, air, grid, build);
  }

  table(cavity: Cavity, infill: Infill | null, air: Air, grid: SpectrumGrid, build: () => CavityTable): CavityTable {
    return this.tables.get({ cavity, infill }, air, grid, build);
  }
}
