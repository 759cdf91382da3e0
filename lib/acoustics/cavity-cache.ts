/**
 * The cavity's impedance does not depend on the facing: Zs = Z_facing + Z_cavity at every
 * frequency and angle. A sweep over hole patterns (the design assistant) or a slider on the
 * facing (the tuning bench) can therefore keep the cavity's table and only add the facing.
 * The cache is explicit, passed in EvaluateOptions; without it every evaluation is computed anew.
 */
import type { Air } from "./air";
import type { Cavity, Infill } from "./build-up";
import { cavityLayers } from "./build-up";
import type { FacingImpedance } from "./facing-impedance";
import { locallyReactingField, obliqueAbsorption } from "./incidence";
import { type LayeredModel, fieldSum } from "./layered-model";
import type { SpectrumGrid } from "./spectrum";

export interface CavityTable {
  normalRe: Float64Array;
  normalIm: Float64Array;
  /** per frequency, q.n angles; empty for a locally reacting cavity */
  fieldRe: Float64Array;
  fieldIm: Float64Array;
}

export function cavityTable(model: LayeredModel, grid: SpectrumGrid): CavityTable {
  const { frequencies, q } = grid;
  const nf = frequencies.length;
  const size = grid.locallyReacting ? 0 : nf * q.n;
  const table: CavityTable = {
    normalRe: new Float64Array(nf),
    normalIm: new Float64Array(nf),
    fieldRe: new Float64Array(size),
    fieldIm: new Float64Array(size),
  };
  for (let k = 0; k < nf; k++) {
    model.setFrequency(frequencies[k]);
    model.impedance();
    table.normalRe[k] = model.cavityRe;
    table.normalIm[k] = model.cavityIm;
    if (!grid.locallyReacting) model.cavityImpedances(q, table.fieldRe, table.fieldIm, k * q.n);
  }
  return table;
}

/** Normal and field-incidence absorption from a cavity table and a facing. */
export function fillFromTable(facing: FacingImpedance, table: CavityTable, grid: SpectrumGrid): void {
  const { frequencies, q, normal, diffuse } = grid;
  for (let k = 0; k < frequencies.length; k++) {
    facing.at(frequencies[k]);
    facing.surface(table.normalRe[k], table.normalIm[k]);
    const zr = facing.sr;
    const zi = facing.si;
    normal[k] = obliqueAbsorption(zr, zi, 1);
    diffuse[k] = grid.locallyReacting ? locallyReactingField(zr, zi, q) : fieldSum(table.fieldRe, table.fieldIm, k * q.n, facing, q);
  }
}

export class CavityCache {
  private readonly tables = new Map<string, CavityTable>();

  constructor(private readonly limit = 64) {}

  table(cavity: Cavity, infill: Infill | null, air: Air, grid: SpectrumGrid, build: () => CavityTable): CavityTable {
    const { frequencies, q } = grid;
    const key = JSON.stringify([cavityLayers(cavity, infill), cavity.partitioned, air.c, air.rho, frequencies.length, frequencies[0], q.n, q.maxAngleDeg]);
    const hit = this.tables.get(key);
    if (hit) return hit;
    const table = build();
    if (this.tables.size >= this.limit) this.tables.delete(this.tables.keys().next().value as string);
    this.tables.set(key, table);
    return table;
  }
}
