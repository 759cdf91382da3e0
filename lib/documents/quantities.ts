/**
 * What the installer and the fabricator count: the cut list (facing boards and infill batts per
 * panel type) and the placement schedule (every panel's code, surface, type, set-out from the
 * surface's lower-left datum and size). Pure; the shop drawing prints these rows and the CSV
 * files carry the same rows.
 */
import type { SnapshotPanelType, SubmittalSnapshot } from "@/lib/submittals";

export interface CutListRow {
  item: "facing" | "infill";
  /** panel type code */
  type: string;
  buildUp: string;
  material: string;
  /** m */
  width: number;
  height: number;
  thickness: number;
  quantity: number;
}

export interface PlacementRow {
  code: string;
  surfaceKey: string;
  surface: string;
  type: string;
  buildUp: string;
  /** set-out of the lower-left corner from the surface's lower-left datum, m */
  x: number;
  y: number;
  width: number;
  height: number;
}

const buildUpOf = (s: SubmittalSnapshot, id: string) => s.buildUps.find((b) => b.id === id)!;

/** Panel types that are placed at least once, in schedule order. */
export const placedTypes = (s: SubmittalSnapshot): SnapshotPanelType[] => s.panelTypes.filter((t) => t.count > 0);

export function cutList(s: SubmittalSnapshot): CutListRow[] {
  return placedTypes(s).flatMap((t) => {
    const b = buildUpOf(s, t.buildUpId);
    const facing: CutListRow = {
      item: "facing",
      type: t.code,
      buildUp: b.name,
      material: b.facingMaterial || "facing board",
      width: t.width,
      height: t.height,
      thickness: b.spec.facing.thickness,
      quantity: t.count,
    };
    const infill = b.spec.infill;
    if (!infill) return [facing];
    const material = `porous infill, flow resistivity ${Math.round(infill.flowResistivity).toLocaleString("en-GB")} Pa·s/m², ${infill.position === "behind-facing" ? "behind the facing" : "on the backing"}`;
    return [facing, { item: "infill" as const, type: t.code, buildUp: b.name, material, width: t.width, height: t.height, thickness: infill.thickness, quantity: t.count }];
  });
}

export function placementRows(s: SubmittalSnapshot): PlacementRow[] {
  const names = new Map(s.surfaces.map((x) => [x.key, x.name]));
  return s.placements.map((p) => ({
    code: p.code,
    surfaceKey: p.surfaceKey,
    surface: names.get(p.surfaceKey) ?? p.surfaceKey,
    type: p.type,
    buildUp: buildUpOf(s, p.buildUpId).code,
    x: p.x,
    y: p.y,
    width: p.width,
    height: p.height,
  }));
}

/** Holes (or slots) per panel of a type, and in all. */
export function openingsOf(t: SnapshotPanelType): { each: number; word: "holes" | "slots" } {
  return t.pattern.kind === "holes" ? { each: t.pattern.holeCount, word: "holes" } : { each: t.pattern.slotCount, word: "slots" };
}
