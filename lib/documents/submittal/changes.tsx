import { Text, View } from "@react-pdf/renderer";
import type { ChangeList } from "@/lib/submittals";
import { fireChangeLines, placementChangeLines, type ScheduleChangeRow, scheduleChangeRows } from "../change-words";
import { formatChange, STANDING_WORDS } from "../format";
import { Paragraph, SectionTitle } from "../parts/frame";
import { Table } from "../parts/table";
import { styles } from "../theme";
import type { DocContext } from "./context";

export function Changes(c: DocContext) {
  const ch = c.s.changes;
  if (!ch) {
    return (
      <View>
        <SectionTitle kicker="1  Changes" title="What changed since the previous revision" />
        <Paragraph>This is the first revision of this room&apos;s submittal: there is no earlier revision to compare with.</Paragraph>
      </View>
    );
  }
  const { f } = c;
  const rows = scheduleChangeRows(ch, f);
  const panelLines = placementChangeLines(c.s, ch);
  return (
    <View>
      <SectionTitle kicker="1  Changes" title={`What changed since revision ${ch.from}`} />
      <Paragraph soft>{`Compared with revision ${ch.from} (snapshot ${c.s.revision.previous?.hash ?? ""}).`}</Paragraph>
      <Text style={styles.h3}>Panel schedule</Text>
      {rows.length ? (
        <Table
          columns={[
            { header: "Code", width: 0.6, cell: (r: ScheduleChangeRow) => r.code },
            { header: "Build-up", width: 2.2, cell: (r) => r.name },
            { header: "What", width: 1.8, cell: (r) => r.what },
            { header: `Revision ${ch.from}`, width: 1.6, numeric: true, cell: (r) => r.before },
            { header: `Revision ${ch.to}`, width: 1.6, numeric: true, cell: (r) => r.after },
          ]}
          rows={rows}
        />
      ) : (
        <Paragraph>No schedule row was added, removed or changed.</Paragraph>
      )}
      <Text style={styles.h3}>Panels on the elevations</Text>
      {panelLines.length ? panelLines.map((line) => <Paragraph key={line}>{line}</Paragraph>) : <Paragraph>No panel was added, removed, moved or resized.</Paragraph>}
      <Text style={styles.h3}>Predicted reverberation time after treatment</Text>
      <Table
        columns={[
          { header: "Octave", width: 1, cell: (r: ChangeList["check"][number]) => f.octave(r.f) },
          { header: `Revision ${ch.from}`, width: 1, numeric: true, cell: (r) => f.seconds(r.before) },
          { header: `Revision ${ch.to}`, width: 1, numeric: true, cell: (r) => f.seconds(r.after) },
          { header: "Change", width: 1, numeric: true, cell: (r) => (r.before === null || r.after === null ? "–" : `${r.after - r.before >= 0 ? "+" : "−"}${Math.abs(r.after - r.before).toFixed(2)} s`) },
          { header: "Standing", width: 2, cell: (r) => (r.statusBefore === r.statusAfter ? STANDING_WORDS[r.statusAfter] : `${STANDING_WORDS[r.statusBefore]}, now ${STANDING_WORDS[r.statusAfter]}`) },
        ]}
        rows={ch.check}
      />
      {ch.room.length > 0 && (
        <View>
          <Text style={styles.h3}>The room</Text>
          <Table
            columns={[
              { header: "What", width: 2, cell: (r: ChangeList["room"][number]) => r.label },
              { header: `Revision ${ch.from}`, width: 1.5, cell: (r) => formatChange(r.before, r.kind, f) },
              { header: `Revision ${ch.to}`, width: 1.5, cell: (r) => formatChange(r.after, r.kind, f) },
            ]}
            rows={ch.room}
          />
        </View>
      )}
      {ch.fire.length > 0 && (
        <View>
          <Text style={styles.h3}>Fire findings</Text>
          {fireChangeLines(ch).map((line) => (
            <Paragraph key={line}>{line}</Paragraph>
          ))}
        </View>
      )}
      <Paragraph soft>{`Open review pins: ${ch.pins.before} at revision ${ch.from}, ${ch.pins.after} now.`}</Paragraph>
    </View>
  );
}
