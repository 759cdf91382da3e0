import { Text, View } from "@react-pdf/renderer";
import type { ChangeList, PlacementRef } from "@/lib/submittals";
import { FIRE_STATUS_WORDS, formatChange, STANDING_WORDS } from "../format";
import { Paragraph, SectionTitle } from "../parts/frame";
import { Table } from "../parts/table";
import { styles } from "../theme";
import { type DocContext, surfaceName } from "./context";

const MAX_CODES = 40;

/** "P-001, P-002 and P-007 on Wall A (length)", at most MAX_CODES codes named per surface. */
function codesBySurface(c: DocContext, refs: readonly PlacementRef[]): string[] {
  const bySurface = new Map<string, string[]>();
  for (const r of refs) bySurface.set(r.surfaceKey, [...(bySurface.get(r.surfaceKey) ?? []), r.code]);
  return [...bySurface].map(([key, codes]) => {
    const named = codes.slice(0, MAX_CODES).join(", ");
    const more = codes.length > MAX_CODES ? ` and ${codes.length - MAX_CODES} more` : "";
    return `${named}${more} on ${surfaceName(c.s, key)}`;
  });
}

type Row = { code: string; name: string; what: string; before: string; after: string };

function scheduleRows(c: DocContext, ch: ChangeList): Row[] {
  const { f } = c;
  const brief = (r: { count: number; area: number }) => `${f.count(r.count)} panels, ${f.area(r.area)}`;
  return [
    ...ch.schedule.added.map((r) => ({ code: r.code, name: r.name, what: "added", before: "none", after: brief(r) })),
    ...ch.schedule.removed.map((r) => ({ code: r.code, name: r.name, what: "removed", before: brief(r), after: "none" })),
    ...ch.schedule.changed.flatMap((r) => r.fields.map((x) => ({ code: r.code, name: r.name, what: x.label, before: formatChange(x.before, x.kind, f), after: formatChange(x.after, x.kind, f) }))),
  ];
}

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
  const rows = scheduleRows(c, ch);
  const panelLines = [
    ...codesBySurface(c, ch.placements.added).map((t) => `Added: ${t}.`),
    ...codesBySurface(c, ch.placements.removed).map((t) => `Removed: ${t}.`),
    ...codesBySurface(c, ch.placements.changed.filter((p) => p.what.includes("moved"))).map((t) => `Moved: ${t}.`),
    ...codesBySurface(c, ch.placements.changed.filter((p) => p.what.includes("resized"))).map((t) => `Resized: ${t}.`),
    ...codesBySurface(c, ch.placements.changed.filter((p) => p.what.includes("build-up"))).map((t) => `Another build-up: ${t}.`),
  ];
  return (
    <View>
      <SectionTitle kicker="1  Changes" title={`What changed since revision ${ch.from}`} />
      <Paragraph soft>{`Compared with revision ${ch.from} (snapshot ${c.s.revision.previous?.hash ?? ""}).`}</Paragraph>
      <Text style={styles.h3}>Panel schedule</Text>
      {rows.length ? (
        <Table
          columns={[
            { header: "Code", width: 0.6, cell: (r: Row) => r.code },
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
          {ch.fire.map((x) => (
            <Paragraph key={x.buildUpId}>{`${x.code} ${x.name}: ${x.before ? FIRE_STATUS_WORDS[x.before] : "not in the schedule"}, now ${x.after ? FIRE_STATUS_WORDS[x.after] : "not in the schedule"}.`}</Paragraph>
          ))}
        </View>
      )}
      <Paragraph soft>{`Open review pins: ${ch.pins.before} at revision ${ch.from}, ${ch.pins.after} now.`}</Paragraph>
    </View>
  );
}
