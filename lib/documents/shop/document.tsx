import { Document } from "@react-pdf/renderer";
import { freezeSnapshot } from "@/lib/submittals";
import { requireApproval } from "../decision";
import { formatters } from "../format";
import { placedTypes } from "../quantities";
import { documentDate, renderPdf } from "../render";
import { laidOutSurfaces } from "../submittal/context";
import type { ShopContext, ShopPackInput } from "./context";
import { PlacementScheduleSheets } from "./placement-schedule";
import { PanelTypeSheet, QuantitiesSheet, SurfaceSheet } from "./sheets";

export function shopContext(input: ShopPackInput): ShopContext {
  requireApproval(input.approval);
  return { s: input.snapshot, hash: freezeSnapshot(input.snapshot).hash, pdfHash: input.submittalPdfHash, approval: input.approval, f: formatters(input.units) };
}

/** The shop drawing of an approved revision: quantities and cut list, one sheet per panel type, set-out per surface, the placement schedule. */
export function ShopDrawingDocument({ c }: { c: ShopContext }) {
  const { s } = c;
  return (
    <Document
      title={`Shop drawing ${s.project.reference ?? s.project.name}: ${s.room.name}, revision ${s.revision.letter}`}
      author={s.consultant.name}
      creator="Cavitas"
      producer="Cavitas"
      language="en"
      keywords={`snapshot-sha256 ${c.hash} submittal-sha256 ${c.pdfHash}`}
      creationDate={documentDate(c.approval.decidedAt)}
    >
      <QuantitiesSheet c={c} />
      {placedTypes(s).map((t) => (
        <PanelTypeSheet key={t.code} c={c} t={t} />
      ))}
      {laidOutSurfaces(s).map((surface) => (
        <SurfaceSheet key={surface.key} c={c} surface={surface} />
      ))}
      <PlacementScheduleSheets c={c} />
    </Document>
  );
}

export function renderShopDrawingPdf(input: ShopPackInput): Promise<Uint8Array> {
  return renderPdf(<ShopDrawingDocument c={shopContext(input)} />);
}
