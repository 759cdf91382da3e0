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
import { cavityLayers } from "./build-up";
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

/** A map of at most `limit` entries, the oldest dropped first. */
class Bounded<T> {
  private readonly entries = new Map<string, T>();

  constructor(private readonly limit: number) {}

  get(key: string, build: () => T): T {
    const hit = this.entries.get(key);
    if (hit) return hit;
    const value = build();
    if (this.entries.size >= this.limit) this.entries.delete(this.entries.keys().next().value as string);
    this.entries.set(key, value);
    return value;
  }
}

export class CavityCache {
  private readonly tables: Bounded<CavityTable>;
  private readonly facings: Bounded<Float64Array>;

  constructor(limit = 64) {
    this.tables = new Bounded(limit);
    this.facings = new Bounded(limit);
  }

  facing(facing: Facing, air: Air, grid: SpectrumGrid, build: () => Float64Array): Float64Array {
    const { frequencies } = grid;
    return this.facings.get(JSON.stringify([facing, air.c, air.rho, air.eta, frequencies.length, frequencies[0]]), build);
  }

  table(cavity: Cavity, infill: Infill | null, air: Air, grid: SpectrumGrid, build: () => CavityTable): CavityTable {
    const { frequencies, q } = grid;
    const key = JSON.stringify([cavityLayers(cavity, infill), cavity.partitioned, air.c, air.rho, frequencies.length, frequencies[0], q.n, q.maxAngleDeg, grid.adaptive]);
    return this.tables.get(key, build);
  }
}
