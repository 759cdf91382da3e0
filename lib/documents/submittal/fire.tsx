import { Text, View } from "@react-pdf/renderer";
import { FIRE_STATUS_WORDS, formatInstant } from "../format";
import { Paragraph, SectionTitle } from "../parts/frame";
import { HashBlock } from "../parts/hash";
import { Notice, Table } from "../parts/table";
import { COLOURS, styles } from "../theme";
import { buildUpOf, type DocContext, surfaceName } from "./context";
import { OVERHEAD_CAUTION } from "./elevations";

type Finding = DocContext["s"]["fire"]["findings"][number];

export function FireAndCautions(c: DocContext) {
  const { s, f } = c;
  const required = s.fire.required ? `${s.fire.required} (${s.fire.requiredFrom === "room" ? "entered for this room" : "the project's default"})` : "none entered: enter the class the governing code requires";
  const flagged = s.fire.findings.filter((x) => x.finding.flagged);
  const overhead = s.cautions.ceilings.length > 0 || s.cautions.highLevelPanels.length > 0;
  return (
    <View>
      <SectionTitle kicker="6  Cautions" title="Fire performance of the finishes" />
      <Paragraph>{`Required class for this room: ${required}.`}</Paragraph>
      <Table
        columns={[
          { header: "Code", width: 0.5, cell: (x: Finding) => buildUpOf(s, x.buildUpId).code },
          { header: "Build-up", width: 1.8, cell: (x) => buildUpOf(s, x.buildUpId).name },
          { header: "Declared", width: 1.4, cell: (x) => (x.finding.declared ? `${x.finding.declared} (${buildUpOf(s, x.buildUpId).fire.standard})` : buildUpOf(s, x.buildUpId).fire.declared || "none") },
          { header: "Test report", width: 1.4, cell: (x) => buildUpOf(s, x.buildUpId).fire.report ?? "none on file" },
          { header: "Required", width: 0.9, cell: (x) => x.finding.required ?? "none" },
          { header: "Standing", width: 1.2, cell: (x) => FIRE_STATUS_WORDS[x.finding.status] },
        ]}
        rows={s.fire.findings}
        tone={(x) => (x.finding.flagged ? COLOURS.cautionSoft : undefined)}
      />
      {flagged.map((x) => (
        <Paragraph key={x.buildUpId}>{`${buildUpOf(s, x.buildUpId).code}: ${x.finding.message}`}</Paragraph>
      ))}
      <Notice title="Fire classification is decided by the governing code, not by this document" tone="caution">
        <Text>
          A classification belongs to the tested product as built: facing, coating, any fleece or infill, cavity and substrate. Cavitas records the class the manufacturer declares and the test report on file; it tests and certifies nothing. What class is required depends on the occupancy, where in the building the finish is, sprinklers and the jurisdiction. A flag, or the absence of one, is not an approval: check every finish with the governing code and the authority having jurisdiction before it is ordered.
        </Text>
      </Notice>
      {overhead && (
        <View wrap={false}>
          <Text style={styles.h3}>Overhead and high-level panels</Text>
          <Notice title={[s.cautions.ceilings.length ? `Panels on ${s.cautions.ceilings.map((k) => (surfaceName(s, k) === "Ceiling" ? "the ceiling" : surfaceName(s, k))).join(", ")}` : "", s.cautions.highLevelPanels.length ? `wall panels whose top is above ${f.len(s.cautions.highLevel)}: ${s.cautions.highLevelPanels.join(", ")}` : ""].filter(Boolean).join("; ")} tone="caution">
            <Text>{`${OVERHEAD_CAUTION} Follow the manufacturer's installation instructions and safe practice for work at height.`}</Text>
          </Notice>
        </View>
      )}
    </View>
  );
}

export function DecisionBlock(c: DocContext) {
  const { s, hash } = c;
  return (
    <View wrap={false} style={{ marginTop: 10 }}>
      <SectionTitle kicker="7  Decision" title="The client's decision" />
      <View style={{ borderWidth: 1, borderColor: COLOURS.ink, padding: 10 }}>
        <Text style={{ marginBottom: 4 }}>
          {s.revision.issuedAt
            ? `Issued ${formatInstant(s.revision.issuedAt)} by ${s.consultant.name} for the client's decision: approve, approve as noted, or return for revision.`
            : "Draft: this revision has not been issued and cannot be decided."}
        </Text>
        <Text style={{ marginBottom: 4 }}>
          The client records the decision in Cavitas with their full name typed as signature. Cavitas keeps the decision, the signer, the time and this document&apos;s SHA-256, and issues a one-page decision record that cites the snapshot below. The consultant does not decide their own submittal.
        </Text>
        <HashBlock label="Snapshot SHA-256" hash={hash} size={8} />
      </View>
    </View>
  );
}
