import { Text, View } from "@react-pdf/renderer";
import type { SnapshotOctave } from "@/lib/submittals";
import { STANDING_WORDS } from "../format";
import { Paragraph, SectionTitle } from "../parts/frame";
import { ReverbFigure, ReverbLegendMarks } from "../parts/reverb-figure";
import { Facts, Notice, Table } from "../parts/table";
import { COLOURS, styles } from "../theme";
import type { DocContext } from "./context";

const METHOD_WORDS = { sabine: "Sabine", eyring: "Eyring" } as const;

export function Reverberation(c: DocContext) {
  const { s, f } = c;
  if (!s.check.ok) {
    return (
      <View>
        <SectionTitle kicker="2  Reverberation" title="Reverberation time: target and prediction" />
        <Notice title="The check could not run" tone="fault">
          {s.check.issues.map((i) => (
            <Text key={i.field + i.message}>{`${i.field}: ${i.message}`}</Text>
          ))}
        </Notice>
      </View>
    );
  }
  const check = s.check;
  const method = check.method;
  const band = (o: SnapshotOctave) => {
    const { low, high } = o.target;
    if (low !== null && high !== null) return `${low.toFixed(2)} to ${high.toFixed(2)} s`;
    if (high !== null) return `at most ${high.toFixed(2)} s`;
    if (low !== null) return `at least ${low.toFixed(2)} s`;
    return "–";
  };
  const flagged = (o: SnapshotOctave) => (o.status === "over" || o.status === "under" ? COLOURS.cautionSoft : undefined);
  const points = check.octaves.map((o) => ({ f: o.f, before: o.before?.[method] ?? null, after: o.after?.[method] ?? null, low: o.target.low, high: o.target.high }));
  return (
    <View>
      <SectionTitle kicker="2  Reverberation" title="Reverberation time: target and prediction" />
      <Paragraph soft>
        {`Predicted per octave for the room as drawn (${f.volume(s.room.volume)}, ${s.room.air.temperature} °C, ${s.room.air.humidity} % relative humidity), before and after treatment, by Sabine's and Eyring's formulas with air absorption; the standing is read from ${METHOD_WORDS[method]}'s. Octaves where the standing falls outside the target are shaded.`}
      </Paragraph>
      <Table
        columns={[
          { header: "Octave", width: 0.9, cell: (o: SnapshotOctave) => f.octave(o.f) },
          { header: "Target", width: 1.5, numeric: true, cell: band },
          { header: "Before, Sabine", width: 1.1, numeric: true, cell: (o) => f.seconds(o.before?.sabine) },
          { header: "After, Sabine", width: 1.1, numeric: true, cell: (o) => f.seconds(o.after?.sabine) },
          { header: "After, Eyring", width: 1.1, numeric: true, cell: (o) => f.seconds(o.after?.eyring) },
          { header: "Standing", width: 1, cell: (o) => STANDING_WORDS[o.status] },
          { header: "Lacking, m² sabins", width: 1.2, numeric: true, cell: (o) => (o.after?.shortfall ? o.after.shortfall.toFixed(1) : "–") },
        ]}
        rows={check.octaves}
        tone={flagged}
      />
      {check.mean && (
        <Paragraph>
          {`Mean of ${check.mean.octaves.map(f.octave).join(" and ")}: ${f.seconds(check.mean.before)} before, ${f.seconds(check.mean.after)} after treatment, against ${f.seconds(check.mean.nominal)}${check.mean.low !== null && check.mean.high !== null ? ` (${f.seconds(check.mean.low)} to ${f.seconds(check.mean.high)})` : ""}: ${STANDING_WORDS[check.mean.status] ?? check.mean.status}.`}
        </Paragraph>
      )}
      <View wrap={false} style={{ marginVertical: 6 }}>
        <ReverbFigure points={points} treated={check.treated} height={175} />
        <ReverbLegendMarks treated={check.treated} />
      </View>
      {check.sentences.map((line) => (
        <Paragraph key={line}>{line}</Paragraph>
      ))}
      {s.target && (
        <View minPresenceAhead={40}>
          <Text style={styles.h3}>The target</Text>
          <Facts
            items={[
              ["Target", s.target.label],
              ["Source", s.target.source],
              ["Provenance", s.target.provenance],
              ["Note", s.target.note],
              ...s.target.warnings.map((w, i): [string, string] => [i === 0 ? "Warnings" : "", w]),
            ]}
          />
        </View>
      )}
    </View>
  );
}
