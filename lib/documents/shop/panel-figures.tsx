import { G, Line, Path, Rect, Svg } from "@react-pdf/renderer";
import { toBuildUp } from "@/lib/acoustics/contract";
import { panelPattern } from "@/lib/board/pattern";
import type { Rect as BoardRect } from "@/lib/board/types";
import type { SnapshotBuildUp, SnapshotPanelType } from "@/lib/submittals";
import type { Formatters } from "../format";
import { Dimension } from "../parts/dimension";
import { ScaleBarMarks } from "../parts/elevation-figure";
import { SvgText } from "../parts/svg-text";
import { chooseScale, type Scale, scaleBar } from "../scale";
import { COLOURS } from "../theme";

/** Sheet points of a point on the panel (m from its lower-left corner), for a drawing whose corner sits at (ox, oy). */
const mapper = (scale: Scale, ox: number, oy: number) => ({ x: (x: number) => ox + x * scale.ptPerM, y: (y: number) => oy - y * scale.ptPerM });

/** The holes or slots of a panel type inside `clip`, as one path (or the field's tone when too small to draw). */
function Marks({ t, b, scale, clip, ox, oy }: { t: SnapshotPanelType; b: SnapshotBuildUp; scale: Scale; clip: BoardRect; ox: number; oy: number }) {
  const at = mapper(scale, ox, oy);
  const drawn = panelPattern(toBuildUp(b.spec).facing, { x: 0, y: 0, width: t.width, height: t.height }, { borderX: b.borders.x, borderY: b.borders.y }, { scale: scale.ptPerM, clip, maxMarks: 60_000 });
  if (drawn.holes) {
    const r = (t.pattern.kind === "holes" ? t.pattern.holeDiameter / 2 : 0) * scale.ptPerM;
    const parts: string[] = [];
    for (let i = 0; i < drawn.holes.length; i += 2) {
      const cx = at.x(drawn.holes[i]);
      const cy = at.y(drawn.holes[i + 1]);
      parts.push(`M${(cx - r).toFixed(2)} ${cy.toFixed(2)}a${r.toFixed(2)} ${r.toFixed(2)} 0 1 0 ${(2 * r).toFixed(2)} 0a${r.toFixed(2)} ${r.toFixed(2)} 0 1 0 ${(-2 * r).toFixed(2)} 0`);
    }
    return <Path d={parts.join("")} fill={COLOURS.ink} />;
  }
  if (drawn.slots) {
    const parts: string[] = [];
    for (let i = 0; i < drawn.slots.length; i += 4) {
      const [x, y, w, h] = [drawn.slots[i], drawn.slots[i + 1], drawn.slots[i + 2], drawn.slots[i + 3]];
      parts.push(`M${at.x(x).toFixed(2)} ${at.y(y + h).toFixed(2)}h${(w * scale.ptPerM).toFixed(2)}v${(h * scale.ptPerM).toFixed(2)}h${(-w * scale.ptPerM).toFixed(2)}z`);
    }
    return <Path d={parts.join("")} fill={COLOURS.ink} />;
  }
  const f = drawn.field;
  return <Rect x={at.x(f.x)} y={at.y(f.y + f.height)} width={f.width * scale.ptPerM} height={f.height * scale.ptPerM} fill={COLOURS.ink} fillOpacity={drawn.detail.tone} />;
}

/** The whole panel to scale: outline, perforated field, every hole or slot, overall size and border margins. */
export function PanelFigure({ t, b, f, width, height, sheet }: { t: SnapshotPanelType; b: SnapshotBuildUp; f: Formatters; width: number; height: number; sheet: string }) {
  const pad = { left: 34, right: 10, top: 34, bottom: 46 };
  const scale = chooseScale(t, { width: width - pad.left - pad.right, height: height - pad.top - pad.bottom });
  const w = t.width * scale.ptPerM;
  const h = t.height * scale.ptPerM;
  const ox = pad.left + (width - pad.left - pad.right - w) / 2;
  const oy = pad.top + h;
  const at = mapper(scale, ox, oy);
  const field = t.field;
  return (
    <Svg width={width} height={height} viewBox={`0 0 ${width} ${height}`}>
      <Rect x={ox} y={oy - h} width={w} height={h} fill="#fffdf8" stroke={COLOURS.ink} strokeWidth={1.1} />
      <Rect x={at.x(field.x)} y={at.y(field.y + field.height)} width={field.width * scale.ptPerM} height={field.height * scale.ptPerM} fill="none" stroke={COLOURS.copper} strokeWidth={0.5} strokeDasharray="3 2" />
      <Marks t={t} b={b} scale={scale} clip={{ x: -1, y: -1, width: t.width + 2, height: t.height + 2 }} ox={ox} oy={oy} />
      <Dimension axis="x" from={ox} to={ox + w} y={oy + 14} label={f.panel(t.width)} />
      <Dimension axis="y" from={oy - h} to={oy} x={ox - 14} label={f.panel(t.height)} />
      <Dimension axis="x" from={ox} to={at.x(field.x)} y={oy - h - 10} label={f.fine(field.x)} size={5.5} />
      <Dimension axis="y" from={oy - h} to={at.y(field.y + field.height)} x={ox + w + 6} label={f.fine(t.height - field.y - field.height)} size={5.5} />
      <SvgText x={ox + w / 2} y={oy - h - 22} anchor="middle" size={6.5}>
        seen from the room side; dashed: perforated field
      </SvgText>
      <ScaleBarMarks x={pad.left} y={height - 14} bar={scaleBar(scale, Math.min(120, width / 2))} f={f} />
      <SvgText x={width - pad.right} y={height - 6} anchor="end">
        {`Scale 1:${scale.denominator} on ${sheet}`}
      </SvgText>
    </Svg>
  );
}

/**
 * The panel's lower-left corner enlarged: the edges, the field's edge, the first holes or slots,
 * and the numbers the fabricator sets the pattern out by (first centre from both edges, pitch,
 * row pitch, diameter or width).
 */
export function PatternDetail({ t, b, f, width, height, sheet }: { t: SnapshotPanelType; b: SnapshotBuildUp; f: Formatters; width: number; height: number; sheet: string }) {
  const p = t.pattern;
  const step = p.kind === "holes" ? p.pitch : p.slotPitch;
  const rowStep = p.kind === "holes" ? p.rowPitch : step;
  const firstX = p.kind === "holes" ? p.firstX : p.direction === "vertical" ? p.first : t.field.x;
  const firstY = p.kind === "holes" ? p.firstY : p.direction === "horizontal" ? p.first : t.field.y;
  const region = { x: 0, y: 0, width: Math.min(t.width, firstX + 2.6 * step), height: Math.min(t.height, firstY + 2.6 * rowStep) };
  const pad = { left: 44, right: 10, top: 14, bottom: 48 };
  const scale = chooseScale(region, { width: width - pad.left - pad.right, height: height - pad.top - pad.bottom });
  const ox = pad.left;
  const oy = pad.top + region.height * scale.ptPerM;
  const at = mapper(scale, ox, oy);
  const right = at.x(region.width);
  const top = at.y(region.height);
  const size = p.kind === "holes" ? `Ø${f.fine(p.holeDiameter)}` : `slots ${f.fine(p.slotWidth)} wide`;
  return (
    <Svg width={width} height={height} viewBox={`0 0 ${width} ${height}`}>
      <Rect x={ox} y={top} width={right - ox} height={oy - top} fill="#fffdf8" />
      <Marks t={t} b={b} scale={scale} clip={region} ox={ox} oy={oy} />
      <Rect x={ox} y={top} width={right - ox} height={oy - top} fill="none" stroke={COLOURS.ink} strokeOpacity={0.25} strokeWidth={0.4} strokeDasharray="1 2" />
      <Line x1={ox} x2={ox} y1={top} y2={oy} stroke={COLOURS.ink} strokeWidth={1.2} />
      <Line x1={ox} x2={right} y1={oy} y2={oy} stroke={COLOURS.ink} strokeWidth={1.2} />
      <Line x1={at.x(t.field.x)} x2={right} y1={at.y(t.field.y)} y2={at.y(t.field.y)} stroke={COLOURS.copper} strokeWidth={0.5} strokeDasharray="3 2" />
      <Line x1={at.x(t.field.x)} x2={at.x(t.field.x)} y1={top} y2={at.y(t.field.y)} stroke={COLOURS.copper} strokeWidth={0.5} strokeDasharray="3 2" />
      <Dimension axis="x" from={ox} to={at.x(firstX)} y={oy + 12} label={f.fine(firstX)} />
      <Dimension axis="x" from={at.x(firstX)} to={at.x(firstX + step)} y={oy + 26} label={f.fine(step)} />
      <Dimension axis="y" from={at.y(firstY)} to={oy} x={ox - 12} label={f.fine(firstY)} />
      {p.kind === "holes" && p.rows > 1 && <Dimension axis="y" from={at.y(firstY + rowStep)} to={at.y(firstY)} x={ox - 28} label={f.fine(rowStep)} />}
      {p.kind === "holes" && p.oddShift > 0 && <Dimension axis="x" from={at.x(firstX)} to={at.x(firstX + p.oddShift)} y={top - 4} label={`${f.fine(p.oddShift)} shift`} size={5.5} />}
      <SvgText x={at.x(firstX) + 6} y={at.y(firstY) - 6} size={7} weight={600} fill={COLOURS.ink}>
        {size}
      </SvgText>
      <SvgText x={pad.left} y={height - 8}>
        {`Lower-left corner, scale 1:${scale.denominator} on ${sheet}; dashed copper: edge of the perforated field`}
      </SvgText>
    </Svg>
  );
}

/**
 * A section through the build-up, to scale: the backing, the cavity with its infill where it
 * sits, and the facing plate, with their depths.
 */
export function SectionFigure({ b, f, width, height, sheet }: { b: SnapshotBuildUp; f: Formatters; width: number; height: number; sheet: string }) {
  const plate = b.spec.facing.thickness;
  const cavity = b.spec.cavity.depth;
  const infill = b.spec.infill ?? null;
  const backing = 0.05;
  const depth = backing + cavity + plate;
  const pad = { left: 10, right: 10, top: 34, bottom: 34 };
  // The band's height is schematic: the scale is chosen on the depth alone.
  const scale = chooseScale({ width: depth, height: 0 }, { width: width - pad.left - pad.right, height: 1 });
  const s = scale.ptPerM;
  const x0 = pad.left;
  const y0 = pad.top;
  const bandHeight = height - pad.top - pad.bottom;
  const cavityX = x0 + backing * s;
  const plateX = cavityX + cavity * s;
  const infillX = infill ? (infill.position === "on-backing" ? cavityX : plateX - infill.thickness * s) : 0;
  const hatch = Array.from({ length: Math.ceil(bandHeight / 6) + 2 }, (_, i) => i * 6);
  return (
    <Svg width={width} height={height} viewBox={`0 0 ${width} ${height}`}>
      <G>
        <Rect x={x0} y={y0} width={backing * s} height={bandHeight} fill={COLOURS.paperDeep} stroke={COLOURS.ink} strokeWidth={0.6} />
        {hatch.map((d) => (
          <Line key={d} x1={x0} y1={y0 + d} x2={x0 + Math.min(backing * s, d)} y2={y0 + d - Math.min(backing * s, d)} stroke={COLOURS.ink} strokeOpacity={0.35} strokeWidth={0.4} />
        ))}
      </G>
      {infill && <Rect x={infillX} y={y0} width={infill.thickness * s} height={bandHeight} fill={COLOURS.copperSoft} stroke={COLOURS.copper} strokeWidth={0.5} />}
      <Rect x={plateX} y={y0} width={Math.max(plate * s, 1)} height={bandHeight} fill={COLOURS.ink} />
      <SvgText x={x0 + 2} y={y0 - 4} size={6}>
        backing
      </SvgText>
      {infill && (
        <SvgText x={infillX + 2} y={y0 + bandHeight / 2} size={6} fill={COLOURS.copperDeep}>
          infill
        </SvgText>
      )}
      <SvgText x={plateX + 3} y={y0 + 8} size={6}>
        facing
      </SvgText>
      <Dimension axis="x" from={cavityX} to={plateX} y={y0 - 14} label={`cavity ${f.fine(cavity)}`} size={6} />
      {infill && <Dimension axis="x" from={infillX} to={infillX + infill.thickness * s} y={y0 + bandHeight + 10} label={f.fine(infill.thickness)} size={6} />}
      <Dimension axis="x" from={plateX} to={plateX + Math.max(plate * s, 1)} y={y0 + bandHeight + 22} label={`plate ${f.fine(plate)}`} size={6} />
      <SvgText x={pad.left} y={height - 2}>
        {`Section, scale 1:${scale.denominator} on ${sheet}${b.spec.cavity.partitioned ? "; cavity partitioned" : "; cavity open"}`}
      </SvgText>
    </Svg>
  );
}
