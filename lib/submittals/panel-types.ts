/**
 * Panel types: each size in which a build-up is placed, with its hole or slot layout and hole
 * count, from the same arithmetic the board draws with (lib/board/pattern-layout.ts). These are
 * what the shop drawing details and the cut list counts.
 */
import { toBuildUp } from "@/lib/acoustics/contract";
import { layoutPattern } from "@/lib/board/pattern-layout";
import type { SnapshotBuildUp, SnapshotPanelType, SnapshotPattern } from "./snapshot";

/** Sizes closer than a tenth of a millimetre are one size (the board's float noise is far below). */
const sizeKey = (w: number, h: number) => `${Math.round(w * 10_000)}x${Math.round(h * 10_000)}`;

export function patternOf(buildUp: Pick<SnapshotBuildUp, "spec" | "borders">, width: number, height: number): { field: SnapshotPanelType["field"]; pattern: SnapshotPattern; panelOpenArea: number } {
  const facing = toBuildUp(buildUp.spec).facing;
  const layout = layoutPattern(facing, { width, height }, { borderX: buildUp.borders.x, borderY: buildUp.borders.y });
  const area = width * height;
  if (layout.kind === "slots") {
    const slotLength = layout.direction === "vertical" ? layout.field.height : layout.field.width;
    const pattern: SnapshotPattern = { kind: "slots", slotWidth: layout.slotWidth, slotPitch: layout.slotPitch, direction: layout.direction, slotCount: layout.slotCount, first: layout.first, slotLength };
    return { field: layout.field, pattern, panelOpenArea: area > 0 ? (layout.slotCount * layout.slotWidth * slotLength) / area : 0 };
  }
  const grid = facing.kind === "slots" ? "square" : facing.grid;
  const { holeDiameter, pitch, rows, rowPitch, columnsEven, columnsOdd, oddShift, firstX, firstY, holeCount } = layout;
  const pattern: SnapshotPattern = { kind: "holes", holeDiameter, pitch, grid, rows, rowPitch, columnsEven, columnsOdd, oddShift, firstX, firstY, holeCount };
  return { field: layout.field, pattern, panelOpenArea: area > 0 ? (holeCount * Math.PI * holeDiameter ** 2) / 4 / area : 0 };
}

/**
 * The panel types of the build-ups, in build-up order; within a build-up the most used size
 * first. A build-up placed in one size has the type code of the build-up ("T1"); in several,
 * "T1-1", "T1-2" …; one not placed at all gets its module size with a count of 0, so the shop
 * drawing can still detail it.
 */
export function panelTypes(buildUps: readonly SnapshotBuildUp[], placements: readonly { buildUpId: string; width: number; height: number }[]): SnapshotPanelType[] {
  const types: SnapshotPanelType[] = [];
  for (const b of buildUps) {
    const sizes = new Map<string, { width: number; height: number; count: number }>();
    for (const p of placements) {
      if (p.buildUpId !== b.id) continue;
      const key = sizeKey(p.width, p.height);
      const size = sizes.get(key) ?? { width: p.width, height: p.height, count: 0 };
      size.count++;
      sizes.set(key, size);
    }
    if (sizes.size === 0) sizes.set("module", { ...b.module, count: 0 });
    const ordered = [...sizes.values()].sort((a, c) => c.count - a.count || a.width - c.width || a.height - c.height);
    ordered.forEach((size, i) => {
      const code = ordered.length === 1 ? b.code : `${b.code}-${i + 1}`;
      types.push({ code, buildUpId: b.id, width: size.width, height: size.height, count: size.count, ...patternOf(b, size.width, size.height) });
    });
  }
  return types;
}

/** The type code of a placement, matched by build-up and size as panelTypes grouped them. */
export function typeCodeOf(types: readonly SnapshotPanelType[], p: { buildUpId: string; width: number; height: number }): string {
  const key = sizeKey(p.width, p.height);
  return types.find((t) => t.buildUpId === p.buildUpId && sizeKey(t.width, t.height) === key)?.code ?? "";
}
