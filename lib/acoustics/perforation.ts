/**
 * Open-area ratio of a perforated or slotted plate, from the exact geometry of each grid.
 * Round holes of diameter d at centre distance b:
 *   square grid              ε = π d² / (4 b²)
 *   60° staggered grid       ε = π d² / (2√3 b²)   (equilateral triangles, centre distance b)
 * Long slots of width w at pitch b: ε = w / b.
 */

export type Grid = "square" | "staggered";

export function roundHoleOpenArea(holeDiameter: number, pitch: number, grid: Grid): number {
  const ratio = (holeDiameter / pitch) ** 2;
  return grid === "square" ? (Math.PI * ratio) / 4 : (Math.PI * ratio) / (2 * Math.sqrt(3));
}

export function slotOpenArea(slotWidth: number, slotPitch: number): number {
  return slotWidth / slotPitch;
}
