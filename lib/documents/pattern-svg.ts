/**
 * A panel type's facing as SVG at 1:1 in millimetres, for the fabricator's cutting software:
 * the panel outline, the perforated field (dashed, for reference) and every hole as a circle or
 * every slot as a rectangle, positioned by the same arithmetic as the board and the shop
 * drawing (lib/board/pattern.ts). SVG's y runs down, so y is measured from the panel's top edge
 * here; the drawing's title says so.
 */
import { holeCentresIn, slotRectsIn } from "@/lib/board/pattern";
import type { HoleLayout, SlotLayout } from "@/lib/board/pattern-layout";
import type { SnapshotPanelType, SubmittalSnapshot } from "@/lib/submittals";

const mm = (m: number) => Number((m * 1000).toFixed(3)).toString();

const escape = (text: string) => text.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;");

/** The board's layout types, rebuilt from the snapshot's pattern of a panel type. */
export function layoutOf(t: SnapshotPanelType): HoleLayout | SlotLayout {
  const p = t.pattern;
  if (p.kind === "holes") {
    return { kind: "holes", holeDiameter: p.holeDiameter, field: t.field, rows: p.rows, rowPitch: p.rowPitch, columnsEven: p.columnsEven, columnsOdd: p.columnsOdd, pitch: p.pitch, oddShift: p.oddShift, firstX: p.firstX, firstY: p.firstY, holeCount: p.holeCount };
  }
  return { kind: "slots", slotWidth: p.slotWidth, slotPitch: p.slotPitch, direction: p.direction, field: t.field, slotCount: p.slotCount, first: p.first };
}

export function facingPatternSvg(s: SubmittalSnapshot, typeCode: string, hash: string): string {
  const t = s.panelTypes.find((x) => x.code === typeCode);
  if (!t) throw new Error(`No panel type ${typeCode} in this snapshot.`);
  const b = s.buildUps.find((x) => x.id === t.buildUpId)!;
  const all = { x: -1, y: -1, width: t.width + 2, height: t.height + 2 };
  const flip = (y: number) => t.height - y;
  const layout = layoutOf(t);
  const marks: string[] = [];
  if (layout.kind === "holes") {
    const { centres, count } = holeCentresIn(layout, { x: 0, y: 0 }, all, Number.POSITIVE_INFINITY);
    const r = mm(layout.holeDiameter / 2);
    for (let i = 0; i < count; i++) marks.push(`<circle cx="${mm(centres[2 * i])}" cy="${mm(flip(centres[2 * i + 1]))}" r="${r}"/>`);
  } else {
    const { rects, count } = slotRectsIn(layout, { x: 0, y: 0 }, all);
    for (let i = 0; i < count; i++) {
      const [x, y, w, h] = [rects[4 * i], rects[4 * i + 1], rects[4 * i + 2], rects[4 * i + 3]];
      marks.push(`<rect x="${mm(x)}" y="${mm(flip(y + h))}" width="${mm(w)}" height="${mm(h)}"/>`);
    }
  }
  const f = t.field;
  const title = `${t.code} ${b.name}: facing ${mm(t.width)} × ${mm(t.height)} mm, ${marks.length} ${layout.kind}`;
  return [
    `<?xml version="1.0" encoding="UTF-8"?>`,
    `<svg xmlns="http://www.w3.org/2000/svg" width="${mm(t.width)}mm" height="${mm(t.height)}mm" viewBox="0 0 ${mm(t.width)} ${mm(t.height)}">`,
    `<title>${escape(title)}</title>`,
    `<desc>${escape(`Cavitas shop pack, ${s.project.name}, ${s.room.name}, revision ${s.revision.letter}, snapshot SHA-256 ${hash}. Units: millimetres at 1:1, origin at the panel's top-left corner, y downwards. Outline: panel edge; dashed: perforated field (reference only).`)}</desc>`,
    `<rect id="outline" x="0" y="0" width="${mm(t.width)}" height="${mm(t.height)}" fill="none" stroke="#000" stroke-width="0.2"/>`,
    `<rect id="field" x="${mm(f.x)}" y="${mm(flip(f.y + f.height))}" width="${mm(f.width)}" height="${mm(f.height)}" fill="none" stroke="#888" stroke-width="0.1" stroke-dasharray="2 2"/>`,
    `<g id="${layout.kind}" fill="#000" stroke="none">`,
    ...marks,
    `</g>`,
    `</svg>`,
    ``,
  ].join("\n");
}
