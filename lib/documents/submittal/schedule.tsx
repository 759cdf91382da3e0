import { Text, View } from "@react-pdf/renderer";
import { describeCavity, describeFacing, describeInfill } from "@/lib/build-ups/describe";
import type { ScheduleRow, SnapshotBuildUp } from "@/lib/submittals";
import { AbsorptionFigure } from "../parts/absorption-figure";
import { Paragraph, SectionTitle } from "../parts/frame";
import { Table } from "../parts/table";
import { COLOURS, styles } from "../theme";
import { buildUpOf, type DocContext, surfaceName } from "./context";

/** "0.85 (LM), class B" */
export function ratingText(b: SnapshotBuildUp): string {
  const r = b.evaluation.ratings;
  return `${r.alphaW.toFixed(2)}${r.shape ? ` (${r.shape})` : ""}`;
}

export function Schedule(c: DocContext) {
  const { s, f } = c;
  const b = (r: ScheduleRow) => buildUpOf(s, r.buildUpId);
  const areaOnly = s.areaTreatments.filter((t) => t.area > 0);
  return (
    <View>
      <SectionTitle kicker="3  Schedule" title="Panel schedule" />
      <Table
        fontSize={7}
        columns={[
          { header: "Code", width: 0.45, cell: (r: ScheduleRow) => r.code },
          {
            header: "Build-up: facing pattern, cavity, infill",
            width: 3.6,
            cell: (r) => `${r.name}\n${describeFacing(b(r).spec, f.units)}\ncavity ${describeCavity(b(r).spec, f.units)}\ninfill ${describeInfill(b(r).spec, f.units)}`,
          },
          { header: "Open area", width: 0.75, numeric: true, cell: (r) => f.percent(b(r).evaluation.openArea) },
          { header: "Helmholtz, peak", width: 0.9, numeric: true, cell: (r) => `${f.hz(b(r).evaluation.helmholtzHz)}\n${f.hz(b(r).evaluation.peakHz)}` },
          { header: "αw (shape)", width: 0.75, numeric: true, cell: (r) => ratingText(b(r)) },
          { header: "Class", width: 0.75, cell: (r) => b(r).evaluation.ratings.class },
          { header: "NRC", width: 0.5, numeric: true, cell: (r) => b(r).evaluation.ratings.nrc.toFixed(2) },
          { header: "Count", width: 0.55, numeric: true, cell: (r) => f.count(r.count) },
          { header: "Area", width: 0.7, numeric: true, cell: (r) => f.area(r.area) },
        ]}
        rows={s.schedule}
      />
      <Paragraph soft>
        Open area is the facing pattern&apos;s own (holes or slots over the perforated field). The Helmholtz frequency is the lumped estimate; the peak is where the full transfer-matrix model absorbs most at normal incidence. αw, the shape indicators and the absorption class follow ISO 11654; NRC follows ASTM C423; both are computed from the predicted diffuse-field values, not measured. Count is the panels laid out on the elevations.
      </Paragraph>
      {areaOnly.length > 0 && (
        <Paragraph>
          {`Treated by area and not yet laid out on an elevation: ${areaOnly.map((t) => `${f.area(t.area)} of ${buildUpOf(s, t.buildUpId).code} on ${surfaceName(s, t.surfaceKey)}`).join("; ")}. These areas count in the reverberation check; their panels are set out when they are placed on the board.`}
        </Paragraph>
      )}
    </View>
  );
}

function Curve({ b, c }: { b: SnapshotBuildUp; c: DocContext }) {
  const { f } = c;
  const e = b.evaluation;
  const r = e.ratings;
  const octaves = e.octaves;
  return (
    <View wrap={false} style={{ marginBottom: 12, flexDirection: "row" }}>
      <AbsorptionFigure
        width={270}
        height={160}
        curves={[
          { points: e.thirdOctaves.map((t) => ({ f: t.f, value: t.normal })), tone: "faint", dashed: true },
          { points: e.thirdOctaves.map((t) => ({ f: t.f, value: t.diffuse })), tone: "copper" },
        ]}
        markers={[
          { f: e.helmholtzHz, label: `Helmholtz ${f.hz(e.helmholtzHz)}` },
          { f: e.peakHz, label: `peak ${f.hz(e.peakHz)}` },
        ]}
      />
      <View style={{ flex: 1, paddingLeft: 10 }}>
        <Text style={styles.kicker}>{b.code}</Text>
        <Text style={{ fontWeight: 600, fontSize: 9.5, marginBottom: 3 }}>{b.name}</Text>
        <Text style={styles.small}>{describeFacing(b.spec, f.units)}</Text>
        <Text style={{ ...styles.small, marginBottom: 5 }}>{`Cavity ${describeCavity(b.spec, f.units)}; infill ${describeInfill(b.spec, f.units)}`}</Text>
        <Table
          fontSize={6.8}
          columns={octaves.map((o) => ({ header: f.octave(o.f), width: 1, numeric: true, cell: () => o.diffuse.toFixed(2) }))}
          rows={[0]}
        />
        <Text style={{ fontSize: 7.5 }}>{`αw ${ratingText(b)}, class ${r.class}; NRC ${r.nrc.toFixed(2)}, SAA ${r.saa.toFixed(2)}`}</Text>
        <Text style={styles.small}>Octave values in the diffuse field. Copper line: diffuse field by one-third octave; dashed: normal incidence.</Text>
        {e.warnings.map((w) => (
          <Text key={w.code} style={{ fontSize: 7, color: COLOURS.caution, marginTop: 2 }}>{w.message}</Text>
        ))}
      </View>
    </View>
  );
}

export function Curves(c: DocContext) {
  return (
    <View>
      <SectionTitle kicker="3  Schedule" title="Absorption curves" minPresenceAhead={170} />
      {c.s.buildUps.map((b) => (
        <Curve key={b.id} b={b} c={c} />
      ))}
    </View>
  );
}
