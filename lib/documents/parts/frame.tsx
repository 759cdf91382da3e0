import type { ReactNode } from "react";
import { Page, Text, View } from "@react-pdf/renderer";
import { COLOURS, styles } from "../theme";

/** One page of a report-style document (submittal, decision record) with its running footer. */
export function ReportPage({ footer, landscape = false, children }: { footer: string; landscape?: boolean; children: ReactNode }) {
  return (
    <Page size="A4" orientation={landscape ? "landscape" : "portrait"} style={styles.page} wrap>
      {children}
      <View fixed style={styles.footer}>
        <Text>{footer}</Text>
        <Text render={({ pageNumber, totalPages }) => `page ${pageNumber} of ${totalPages}`} />
      </View>
    </Page>
  );
}

/** A section's heading: a small copper kicker over the title. */
export function SectionTitle({ kicker, title, minPresenceAhead = 120 }: { kicker: string; title: string; minPresenceAhead?: number }) {
  return (
    <View minPresenceAhead={minPresenceAhead} wrap={false} style={{ marginTop: 6 }}>
      <Text style={styles.kicker}>{kicker}</Text>
      <Text style={styles.h2}>{title}</Text>
    </View>
  );
}

export function Paragraph({ children, soft = false }: { children: ReactNode; soft?: boolean }) {
  return <Text style={{ ...styles.body, ...(soft ? { color: COLOURS.inkSoft } : {}) }}>{children}</Text>;
}
