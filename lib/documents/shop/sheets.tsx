import { Text, View } from "@react-pdf/renderer";
import type { SnapshotPanelType, SnapshotSurface } from "@/lib/submittals";
import { describeCavity, describeFacing, describeInfill } from "@/lib/build-ups/describe";
import { ElevationFigure } from "../parts/elevation-figure";
import { Facts, Notice, Table } from "../parts/table";
import { type CutListRow, cutList, openingsOf, placedTypes } from "../quantities";
import { OVERHEAD_CAUTION } from "../submittal/elevations";
import { COLOURS, styles } from "../theme";
import { DRAWING_AREA, type ShopContext } from "./context";
import { PanelFigure, PatternDetail, SectionFigure } from "./panel-figures";
import { DrawingSheet } from "./sheet";

const buildUpOf = (c: ShopContext, id: string) => c.s.buildUps.find((b) => b.id === id)!;

export function QuantitiesSheet({ c }: { c: ShopContext }) {
  const { s, f } = c;
  const types = placedTypes(s);
  const notPlaced = s.schedule.filter((r) => r.count === 0 || r.areaOnly > 0);
  return (
    <DrawingSheet c={c} title="Quantities and cut list">
      <Text style={styles.kicker}>Quantities</Text>
      <Text style={styles.h2}>Panels by type</Text>
      <Table
        columns={[
          { header: "Type", width: 0.5, cell: (t: SnapshotPanelType) => t.code },
          { header: "Build-up", width: 2, cell: (t) => buildUpOf(c, t.buildUpId).name },
          { header: "Size", width: 1.3, numeric: true, cell: (t) => f.size(t.width, t.height) },
          { header: "Quantity", width: 0.7, numeric: true, cell: (t) => f.count(t.count) },
          { header: "Area", width: 0.8, numeric: true, cell: (t) => f.area(t.count * t.width * t.height) },
          { header: "Per panel", width: 1, numeric: true, cell: (t) => `${f.count(openingsOf(t).each)} ${openingsOf(t).word}` },
          { header: "In all", width: 1, numeric: true, cell: (t) => `${f.count(openingsOf(t).each * t.count)} ${openingsOf(t).word}` },
          { header: "Open area (pattern / panel)", width: 1.4, numeric: true, cell: (t) => `${f.percent(buildUpOf(c, t.buildUpId).evaluation.openArea)} / ${f.percent(t.panelOpenArea)}` },
        ]}
        rows={types}
      />
      <Text style={styles.h2}>Cut list</Text>
      <Table
        columns={[
          { header: "Item", width: 0.6, cell: (r: CutListRow) => r.item },
          { header: "Type", width: 0.5, cell: (r) => r.type },
          { header: "Material", width: 3.4, cell: (r) => r.material },
          { header: "Width", width: 0.8, numeric: true, cell: (r) => f.panel(r.width) },
          { header: "Height", width: 0.8, numeric: true, cell: (r) => f.panel(r.height) },
          { header: "Thickness", width: 0.8, numeric: true, cell: (r) => f.fine(r.thickness) },
          { header: "Quantity", width: 0.7, numeric: true, cell: (r) => f.count(r.quantity) },
        ]}
        rows={cutList(s)}
      />
      <Text style={styles.small}>
        Facing boards at the panel size; infill cut to the same size and fitted to the cavity frame. The facing&apos;s holes or slots follow each type&apos;s sheet and its SVG file (1:1, millimetres) in this shop pack.
      </Text>
      {notPlaced.length > 0 && (
        <View style={{ marginTop: 8 }}>
          <Notice title="Treated by area, not laid out">
            {notPlaced
              .filter((r) => r.areaOnly > 0)
              .map((r) => (
                <Text key={r.buildUpId}>{`${r.code} ${r.name}: ${f.area(r.areaOnly)} entered by area in the design and not placed on an elevation; it is not in these quantities. Ask the consultant for its layout before ordering.`}</Text>
              ))}
          </Notice>
        </View>
      )}
    </DrawingSheet>
  );
}

export function PanelTypeSheet({ c, t }: { c: ShopContext; t: SnapshotPanelType }) {
  const { s, f } = c;
  const b = buildUpOf(c, t.buildUpId);
  const p = t.pattern;
  const on = [...new Set(s.placements.filter((x) => x.type === t.code).map((x) => x.surfaceKey))];
  const overhead = on.some((k) => s.cautions.ceilings.includes(k)) || s.placements.some((x) => x.type === t.code && s.cautions.highLevelPanels.includes(x.code));
  const left = 400;
  const right = DRAWING_AREA.width - left - 16;
  const patternFacts: [string, string][] =
    p.kind === "holes"
      ? [
          ["Holes", `Ø${f.fine(p.holeDiameter)} at ${f.fine(p.pitch)} pitch, ${p.grid === "staggered" ? "60° staggered" : "square"} grid`],
          ["Rows × holes", p.grid === "staggered" ? `${p.rows} rows of ${p.columnsEven} and ${p.columnsOdd} alternately, ${f.fine(p.rowPitch)} apart` : `${p.rows} rows of ${p.columnsEven}, ${f.fine(p.rowPitch)} apart`],
          ["First hole", `centre ${f.fine(p.firstX)} from the left edge, ${f.fine(p.firstY)} from the bottom edge`],
          ["Per panel", `${f.count(p.holeCount)} holes`],
        ]
      : [
          ["Slots", `${f.fine(p.slotWidth)} wide at ${f.fine(p.slotPitch)} pitch, running ${p.direction === "vertical" ? "up" : "across"} the panel, ${f.fine(p.slotLength)} long`],
          ["First slot", `centre line ${f.fine(p.first)} from the ${p.direction === "vertical" ? "left" : "bottom"} edge`],
          ["Per panel", `${f.count(p.slotCount)} slots`],
        ];
  return (
    <DrawingSheet c={c} title={`Panel ${t.code}: ${f.size(t.width, t.height)}`}>
      <Text style={styles.kicker}>{`Panel type ${t.code}`}</Text>
      <Text style={styles.h2}>{`${b.name}: ${f.size(t.width, t.height)}, ${f.count(t.count)} off`}</Text>
      <View style={{ flexDirection: "row" }}>
        <PanelFigure t={t} b={b} f={f} width={left} height={DRAWING_AREA.height - 50} sheet="A3" />
        <View style={{ width: right, marginLeft: 16 }}>
          <PatternDetail t={t} b={b} f={f} width={right} height={330} sheet="A3" />
          <Facts
            labelWidth={96}
            items={[
              ...patternFacts,
              ["Open area", `${f.percent(b.evaluation.openArea)} of the perforated field; ${f.percent(t.panelOpenArea)} of the whole panel`],
              ["Borders", `${f.fine(b.borders.x)} left and right, ${f.fine(b.borders.y)} top and bottom`],
              ["Facing", `${b.facingMaterial || "not named"}; ${describeFacing(b.spec, f.units)}`],
              ["Cavity", describeCavity(b.spec, f.units)],
              ["Infill", describeInfill(b.spec, f.units)],
            ]}
          />
          <SectionFigure b={b} f={f} width={right} height={120} sheet="A3" />
          <Text style={styles.h3}>Cavity and fixing</Text>
          <Text style={{ fontSize: 7.5, marginBottom: 3 }}>
            {`Hold the facing ${f.panel(b.spec.cavity.depth)} off the backing, measured from the back of the facing to the backing, infill included. ${
              b.spec.cavity.partitioned
                ? "The cavity is partitioned: divide it behind each panel (cross battens or a honeycomb core, as the manufacturer's system provides) so that sound cannot run along it; the predictions assume this."
                : "The cavity is open behind the panels; the predictions assume it is not divided."
            } ${b.spec.infill ? `Fit the infill ${b.spec.infill.position === "behind-facing" ? "directly behind the facing" : "against the backing"}, without compressing it.` : ""}`}
          </Text>
          <Text style={{ fontSize: 7.5 }}>Fix to the manufacturer&apos;s system and the fixing design; the positions on these sheets are set-out only.</Text>
          {overhead && (
            <View style={{ marginTop: 6 }}>
              <Notice title="Overhead or high-level panels of this type" tone="caution">
                <Text>{OVERHEAD_CAUTION}</Text>
              </Notice>
            </View>
          )}
          <Text style={{ ...styles.small, marginTop: 4 }}>{`Used on ${on.map((k) => s.surfaces.find((x) => x.key === k)?.name ?? k).join(", ") || "no surface yet"}. Facing pattern file: ${t.code}.svg (1:1, millimetres).`}</Text>
        </View>
      </View>
    </DrawingSheet>
  );
}

export function SurfaceSheet({ c, surface }: { c: ShopContext; surface: SnapshotSurface }) {
  const { s, f } = c;
  const mine = s.placements.filter((p) => p.surfaceKey === surface.key);
  return (
    <DrawingSheet c={c} title={`Set-out: ${surface.name}`}>
      <Text style={styles.kicker}>Set-out</Text>
      <Text style={styles.h2}>{`${surface.name}: ${f.count(mine.length)} panels`}</Text>
      <ElevationFigure surface={surface} placements={mine} width={DRAWING_AREA.width} height={DRAWING_AREA.height - 70} f={f} sheet="A3" setOut />
      <Text style={{ fontSize: 7.5, color: COLOURS.inkSoft }}>
        Running dimensions from the datum (the lower-left corner of the surface, seen from inside the room) to each panel&apos;s left and bottom edge. The placement schedule lists every panel&apos;s set-out and size.
      </Text>
    </DrawingSheet>
  );
}
