import { Document, View } from "@react-pdf/renderer";
import { freezeSnapshot, type SubmittalSnapshot } from "@/lib/submittals";
import { formatters, type UnitPreference } from "../format";
import { Paragraph, ReportPage, SectionTitle } from "../parts/frame";
import { documentDate, renderPdf } from "../render";
import { Assumptions } from "./assumptions";
import { Changes } from "./changes";
import { type DocContext, footerText, laidOutSurfaces } from "./context";
import { Cover } from "./cover";
import { ElevationPages } from "./elevations";
import { DecisionBlock, FireAndCautions } from "./fire";
import { Reverberation } from "./reverberation";
import { Curves, Schedule } from "./schedule";

/** The submittal of one revision, from its snapshot alone. */
export function SubmittalDocument(c: DocContext) {
  const { s } = c;
  const footer = footerText(c, "submittal");
  return (
    <Document
      title={`Submittal ${s.project.reference ?? s.project.name}: ${s.room.name}, revision ${s.revision.letter}`}
      author={s.consultant.name}
      subject={`Room treatment submittal, ${s.project.name}`}
      keywords={`snapshot-sha256 ${c.hash}`}
      creator="Cavitas"
      producer="Cavitas"
      language="en"
      creationDate={documentDate(s.revision.issuedAt)}
    >
      <ReportPage footer={footer}>
        <Cover {...c} />
      </ReportPage>
      <ReportPage footer={footer}>
        <Changes {...c} />
        <View style={{ height: 10 }} />
        <Reverberation {...c} />
      </ReportPage>
      <ReportPage footer={footer}>
        <Schedule {...c} />
        <Curves {...c} />
      </ReportPage>
      {laidOutSurfaces(s).length ? (
        <ElevationPages {...c} />
      ) : (
        <ReportPage footer={footer}>
          <SectionTitle kicker="4  Elevations" title="Elevations" />
          <Paragraph>No panels are laid out on this room&apos;s elevations yet: the treatment is entered by area only.</Paragraph>
        </ReportPage>
      )}
      <ReportPage footer={footer}>
        <Assumptions {...c} />
        <View style={{ height: 10 }} />
        <FireAndCautions {...c} />
        <DecisionBlock {...c} />
      </ReportPage>
    </Document>
  );
}

/**
 * The submittal PDF of a snapshot, in the reader's units (metric unless told otherwise). The
 * same snapshot and units always give the same bytes.
 */
export function renderSubmittalPdf(snapshot: SubmittalSnapshot, options: { units?: UnitPreference } = {}): Promise<Uint8Array> {
  const hash = freezeSnapshot(snapshot).hash;
  return renderPdf(<SubmittalDocument s={snapshot} hash={hash} f={formatters(options.units)} />);
}
