import { Document, Text, View } from "@react-pdf/renderer";
import { freezeSnapshot, type SubmittalSnapshot } from "@/lib/submittals";
import { type DecisionOutcome, OUTCOME_WORDS, type SubmittalDecision } from "./decision";
import { formatInstant } from "./format";
import { Paragraph, ReportPage } from "./parts/frame";
import { HashBlock } from "./parts/hash";
import { Facts } from "./parts/table";
import { documentDate, renderPdf } from "./render";
import { footerText } from "./submittal/context";
import { COLOURS, styles } from "./theme";

export interface DecisionRecordInput {
  snapshot: SubmittalSnapshot;
  /** SHA-256 of the submittal PDF the client decided on, as stored at issue */
  submittalPdfHash: string;
  decision: SubmittalDecision;
}

const MEANING: Record<DecisionOutcome, string> = {
  approved: "The client approves this revision as issued. The installer may build from its shop pack.",
  "approved-as-noted": "The client approves this revision subject to the notes below. The installer may build from its shop pack, taking the notes into account.",
  returned: "The client returns this revision for revision with the notes below. Nothing may be built from it; the consultant issues a next revision.",
};

/** One page recording the client's decision on one revision, citing what was decided on by hash. */
export function DecisionRecordDocument({ snapshot: s, hash, submittalPdfHash, decision }: DecisionRecordInput & { hash: string }) {
  const c = { s, hash };
  return (
    <Document title={`Decision record ${s.project.reference ?? s.project.name}: ${s.room.name}, revision ${s.revision.letter}`} author={decision.signer.name} creator="Cavitas" producer="Cavitas" language="en" keywords={`snapshot-sha256 ${hash} submittal-sha256 ${submittalPdfHash}`} creationDate={documentDate(decision.decidedAt)}>
      <ReportPage footer={footerText(c, "decision on")}>
        <View style={{ flexDirection: "row", justifyContent: "space-between", borderBottomWidth: 1.2, borderBottomColor: COLOURS.ink, paddingBottom: 8, marginBottom: 18 }}>
          <Text style={{ fontSize: 9, fontWeight: 600, letterSpacing: 3, color: COLOURS.copper }}>CAVITAS</Text>
          <Text style={{ fontSize: 9, color: COLOURS.inkSoft }}>Decision record</Text>
        </View>
        <Text style={styles.kicker}>{s.project.name}</Text>
        <Text style={{ fontSize: 18, fontWeight: 600, marginBottom: 4 }}>{`${s.room.name}: submittal revision ${s.revision.letter}`}</Text>
        <View style={{ borderWidth: 1.5, borderColor: COLOURS.ink, padding: 12, marginVertical: 14 }}>
          <Text style={styles.label}>Decision</Text>
          <Text style={{ fontSize: 22, fontWeight: 600, marginVertical: 4 }}>{OUTCOME_WORDS[decision.outcome]}</Text>
          <Text>{MEANING[decision.outcome]}</Text>
        </View>
        <Facts
          labelWidth={120}
          items={[
            ["Signed by", `${decision.signer.name}${decision.signer.email ? ` <${decision.signer.email}>` : ""}, client, by typing their full name`],
            ["Decided", formatInstant(decision.decidedAt)],
            ["Project", `${s.project.name}${s.project.reference ? ` (${s.project.reference})` : ""}`],
            ["Submittal", `revision ${s.revision.letter} of ${s.room.name}, issued ${s.revision.issuedAt ? formatInstant(s.revision.issuedAt) : "(not issued)"} by ${s.consultant.name}${s.consultant.firm ? `, ${s.consultant.firm}` : ""}`],
          ]}
        />
        <Text style={styles.h3}>Notes</Text>
        <View style={{ borderWidth: 0.75, borderColor: COLOURS.rule, backgroundColor: "#fffdf8", padding: 8, minHeight: 60, marginBottom: 14 }}>
          <Text>{decision.notes.trim() || "None."}</Text>
        </View>
        <Text style={styles.h3}>What was decided on</Text>
        <HashBlock label="Submittal PDF SHA-256" hash={submittalPdfHash} />
        <HashBlock label="Snapshot SHA-256" hash={hash} />
        <Paragraph soft>
          The submittal PDF is identified by its SHA-256, recorded when it was issued; the snapshot hash is printed on its cover. A copy of the PDF whose SHA-256 differs is not the document decided on.
        </Paragraph>
      </ReportPage>
    </Document>
  );
}

export function renderDecisionRecordPdf(input: DecisionRecordInput): Promise<Uint8Array> {
  return renderPdf(<DecisionRecordDocument {...input} hash={freezeSnapshot(input.snapshot).hash} />);
}
