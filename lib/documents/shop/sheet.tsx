import type { ReactNode } from "react";
import { Page, Text, View } from "@react-pdf/renderer";
import { OUTCOME_WORDS } from "../decision";
import { formatInstant } from "../format";
import { HashLines } from "../parts/hash";
import { COLOURS, styles } from "../theme";
import { type ShopContext, SHEET } from "./context";

function Field({ label, children }: { label: string; children: ReactNode }) {
  return (
    <View style={{ borderTopWidth: 0.5, borderTopColor: COLOURS.rule, paddingVertical: 4 }}>
      <Text style={{ ...styles.label, fontSize: 6 }}>{label}</Text>
      <View style={{ fontSize: 7.5 }}>{children}</View>
    </View>
  );
}

/** The title block printed on every sheet: what, where, which revision, its approval and hashes. */
function TitleBlock({ c, title }: { c: ShopContext; title: string }) {
  const { s, approval, f } = c;
  return (
    <View fixed style={{ position: "absolute", top: SHEET.margin, right: SHEET.margin, bottom: SHEET.margin, width: SHEET.titleBlock, borderWidth: 1, borderColor: COLOURS.ink, padding: 8, backgroundColor: "#fffdf8" }}>
      <Text style={{ fontSize: 9, fontWeight: 600, letterSpacing: 3, color: COLOURS.copper }}>CAVITAS</Text>
      <Text style={{ fontSize: 8, color: COLOURS.inkSoft, marginBottom: 8 }}>Shop drawing</Text>
      <Text style={{ fontSize: 11, fontWeight: 600, marginBottom: 8 }}>{title}</Text>
      <Field label="Project">
        <Text>{`${s.project.name}${s.project.reference ? ` (${s.project.reference})` : ""}`}</Text>
        {s.project.site ? <Text style={{ color: COLOURS.inkSoft }}>{s.project.site}</Text> : null}
      </Field>
      <Field label="Room">
        <Text>{s.room.name}</Text>
      </Field>
      <Field label="Revision">
        <Text style={{ fontSize: 20, fontWeight: 600 }}>{s.revision.letter}</Text>
        <Text>{`Issued ${s.revision.issuedAt ? formatInstant(s.revision.issuedAt) : "(not issued)"}, ${s.consultant.name}${s.consultant.firm ? `, ${s.consultant.firm}` : ""}`}</Text>
      </Field>
      <Field label="Approval">
        <Text style={{ fontWeight: 600 }}>{OUTCOME_WORDS[approval.outcome]}</Text>
        <Text>{`${approval.signer.name}, ${formatInstant(approval.decidedAt)}`}</Text>
        {approval.outcome === "approved-as-noted" ? <Text style={{ color: COLOURS.inkSoft }}>Build to the notes on the decision record.</Text> : null}
      </Field>
      <Field label="Submittal PDF SHA-256">
        <HashLines hash={c.pdfHash} size={6.6} split />
      </Field>
      <Field label="Snapshot SHA-256">
        <HashLines hash={c.hash} size={6.6} split />
      </Field>
      <Field label="Units and datum">
        <Text>{`Dimensions in ${f.units === "imperial" ? "inches" : "millimetres"}. Set-out from each surface's lower-left corner, seen from inside the room.`}</Text>
      </Field>
      <View style={{ flexGrow: 1 }} />
      <View style={{ backgroundColor: COLOURS.cautionSoft, borderLeftWidth: 2, borderLeftColor: COLOURS.caution, padding: 5, marginBottom: 6 }}>
        <Text style={{ fontSize: 6.8 }}>Positions only. Fixings, and seismic restraint where required, are designed by a competent person; this drawing is not a structural design. Check fire classification with the authority having jurisdiction before ordering.</Text>
      </View>
      <Text style={{ fontSize: 8, fontWeight: 600 }} render={({ pageNumber, totalPages }) => `Sheet ${pageNumber} of ${totalPages}`} />
    </View>
  );
}

/** An A3 landscape sheet: the drawing area on the left, the title block on the right. */
export function DrawingSheet({ c, title, children }: { c: ShopContext; title: string; children: ReactNode }) {
  return (
    <Page size="A3" orientation="landscape" wrap style={{ ...styles.page, paddingTop: SHEET.margin, paddingBottom: SHEET.margin, paddingLeft: SHEET.margin, paddingRight: SHEET.margin + SHEET.titleBlock + SHEET.gap }}>
      <TitleBlock c={c} title={title} />
      {children}
    </Page>
  );
}
