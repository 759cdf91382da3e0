import { Text, View } from "@react-pdf/renderer";
import { ROOM_USE_WORDS, type RoomUse } from "@/lib/room-uses";
import { formatInstant } from "../format";
import { HashBlock } from "../parts/hash";
import { Facts, Notice } from "../parts/table";
import { COLOURS, styles } from "../theme";
import type { DocContext } from "./context";

function meanLine({ s, f }: DocContext): string {
  if (!s.check.ok) return "The reverberation check could not run: see the check section.";
  const m = s.check.mean;
  if (m) {
    const band = m.low !== null && m.high !== null ? ` (${f.seconds(m.low)} to ${f.seconds(m.high)})` : "";
    const over = m.octaves.map((o) => f.octave(o)).join(" and ");
    return `Mean of ${over}: ${f.seconds(m.before)} before treatment, ${f.seconds(m.after)} after; target ${f.seconds(m.nominal)}${band}.`;
  }
  const judged = s.check.octaves.filter((o) => o.status === "within" || o.status === "over" || o.status === "under");
  const within = judged.filter((o) => o.status === "within").length;
  return `${within} of the ${judged.length} octaves the target judges are within it after treatment.`;
}

export function Cover(c: DocContext) {
  const { s, hash, f } = c;
  const placed = s.schedule.reduce((n, r) => n + r.count, 0);
  const byArea = s.schedule.reduce((a, r) => a + r.areaOnly, 0);
  const total = s.schedule.reduce((a, r) => a + r.area, 0);
  const flagged = s.fire.findings.filter((x) => x.finding.flagged).length;
  const state = s.revision.issuedAt ? `Issued for the client's decision, ${formatInstant(s.revision.issuedAt)}` : "Draft: not issued";
  return (
    <View>
      <View style={{ flexDirection: "row", justifyContent: "space-between", borderBottomWidth: 1.2, borderBottomColor: COLOURS.ink, paddingBottom: 8, marginBottom: 18 }}>
        <Text style={{ fontSize: 9, fontWeight: 600, letterSpacing: 3, color: COLOURS.copper }}>CAVITAS</Text>
        <Text style={{ fontSize: 9, color: COLOURS.inkSoft }}>Submittal: room treatment</Text>
      </View>
      <View style={{ flexDirection: "row", marginBottom: 16 }}>
        <View style={{ flex: 1 }}>
          <Text style={styles.kicker}>{s.project.name}</Text>
          <Text style={{ fontSize: 24, fontWeight: 600, lineHeight: 1.2, marginBottom: 6 }}>{s.room.name}</Text>
          <Text style={{ fontSize: 10, color: s.revision.issuedAt ? COLOURS.ink : COLOURS.caution, fontWeight: 500 }}>{state}</Text>
        </View>
        <View style={{ width: 86, height: 86, borderWidth: 1.5, borderColor: COLOURS.ink, alignItems: "center", justifyContent: "center" }}>
          <Text style={styles.label}>Revision</Text>
          <Text style={{ fontSize: 40, fontWeight: 600, color: COLOURS.ink, lineHeight: 1.1 }}>{s.revision.letter}</Text>
        </View>
      </View>
      <Facts
        labelWidth={110}
        items={[
          ["Project", `${s.project.name}${s.project.reference ? ` (${s.project.reference})` : ""}`],
          ["Site", s.project.site ?? "not given"],
          ["Room", `${s.room.name}: ${ROOM_USE_WORDS[s.room.use as RoomUse] ?? s.room.use}, ${f.volume(s.room.volume)}`],
          ["Consultant", `${s.consultant.name}${s.consultant.firm ? `, ${s.consultant.firm}` : ""}`],
          ["Date", s.revision.issuedAt ? formatInstant(s.revision.issuedAt) : "not issued"],
          ["Previous revision", s.revision.previous ? `${s.revision.previous.letter}, snapshot ${s.revision.previous.hash}` : "none: first issue"],
          ["Calculated by", s.engine.version],
        ]}
      />
      <View style={{ borderWidth: 0.75, borderColor: COLOURS.rule, backgroundColor: "#fffdf8", padding: 8, marginVertical: 10 }}>
        <HashBlock label="Snapshot SHA-256" hash={hash} />
        <Text style={styles.small}>The SHA-256 of this revision&apos;s snapshot in canonical JSON: every value in this document comes from it. The client&apos;s decision record and the shop pack cite it.</Text>
      </View>
      <Text style={styles.h3}>In short</Text>
      <Facts
        labelWidth={110}
        items={[
          ["Reverberation", meanLine(c)],
          ["Panels", `${f.count(placed)} laid out on the elevations${byArea > 0 ? `, ${f.area(byArea)} entered by area` : ""}; ${f.area(total)} in all, of ${s.schedule.length} build-up${s.schedule.length === 1 ? "" : "s"}.`],
          ["Fire", s.fire.findings.length === 0 ? "No build-ups." : flagged ? `${flagged} of ${s.fire.findings.length} build-ups flagged: see the fire section.` : `Every build-up's declared class meets the required ${s.fire.required}.`],
          ["Review pins", s.pins.length ? `${s.pins.length} still open at issue: listed under assumptions.` : "none open at issue."],
        ]}
      />
      <Text style={styles.h3}>Contents</Text>
      {["What changed since the previous revision", "Reverberation time: target and prediction", "Panel schedule and absorption curves", "Elevations", "Assumptions and model limits", "Fire performance and installation cautions", "Decision"].map((line, i) => (
        <Text key={line} style={{ marginBottom: 1.5 }}>{`${i + 1}.  ${line}`}</Text>
      ))}
      <View style={{ marginTop: 14 }}>
        <Notice title="Read with the cautions" tone="caution">
          <Text>
            Predicted values are estimates from published models, not laboratory measurements. Fire classifications are as declared by the manufacturers; the governing code and the authority having jurisdiction decide what is acceptable. Fixings for overhead and high-level panels are designed by a competent person.
          </Text>
        </Notice>
      </View>
    </View>
  );
}
