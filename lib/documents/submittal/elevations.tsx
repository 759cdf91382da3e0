import { Text, View } from "@react-pdf/renderer";
import type { SnapshotSurface } from "@/lib/submittals";
import { ElevationFigure } from "../parts/elevation-figure";
import { ReportPage } from "../parts/frame";
import { Notice } from "../parts/table";
import { styles } from "../theme";
import { buildUpOf, type DocContext, footerText, laidOutSurfaces } from "./context";

export const OVERHEAD_CAUTION =
  "Panels on a ceiling or high on a wall can fall. Their fixings must be rated for the load and suitable for the substrate and, where required, include seismic restraint, designed by a competent person (a structural engineer or the manufacturer's engineered system). Positions on this drawing are not a fixing design.";

function ElevationPage({ c, surface }: { c: DocContext; surface: SnapshotSurface }) {
  const { s, f } = c;
  const mine = s.placements.filter((p) => p.surfaceKey === surface.key);
  const types = [...new Set(mine.map((p) => p.type))];
  const high = mine.filter((p) => s.cautions.highLevelPanels.includes(p.code));
  const pins = s.pins.filter((p) => p.surfaceKey === surface.key);
  const byArea = s.areaTreatments.filter((t) => t.surfaceKey === surface.key);
  return (
    <ReportPage landscape footer={footerText(c, "submittal")}>
      <Text style={styles.kicker}>4  Elevations</Text>
      <View style={{ flexDirection: "row", justifyContent: "space-between", alignItems: "flex-end" }}>
        <Text style={styles.h2}>{surface.name}</Text>
        <Text style={styles.small}>
          {`${f.size(surface.width, surface.height)}; ${f.count(mine.length)} panels (${types.map((t) => `${t} ${mine.filter((p) => p.type === t).length}`).join(", ")}); seen from inside the room, measured from the lower-left datum`}
        </Text>
      </View>
      <ElevationFigure surface={surface} placements={mine} pins={pins} width={762} height={surface.kind === "wall" && !high.length ? 430 : 392} f={f} sheet="A4" />
      {pins.length > 0 && <Text style={styles.small}>{`Copper circles: review pins still open at issue (${pins.map((p) => p.number).join(", ")}), listed under assumptions.`}</Text>}
      {byArea.map((t) => (
        <Text key={t.buildUpId} style={styles.small}>{`Also ${f.area(t.area)} of ${buildUpOf(s, t.buildUpId).code} on this surface entered by area, not yet laid out.`}</Text>
      ))}
      {(surface.kind === "ceiling" || high.length > 0) && (
        <Notice title={surface.kind === "ceiling" ? "Overhead panels" : `High-level panels: ${high.map((p) => p.code).join(", ")} (top above ${f.len(s.cautions.highLevel)})`} tone="caution">
          <Text>{OVERHEAD_CAUTION}</Text>
        </Notice>
      )}
    </ReportPage>
  );
}

export function ElevationPages(c: DocContext) {
  const surfaces = laidOutSurfaces(c.s);
  if (!surfaces.length) return null;
  return (
    <>
      {surfaces.map((surface) => (
        <ElevationPage key={surface.key} c={c} surface={surface} />
      ))}
    </>
  );
}
