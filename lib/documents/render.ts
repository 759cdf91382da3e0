import type { ReactElement } from "react";
import { type DocumentProps, renderToBuffer } from "@react-pdf/renderer";
import { registerDocumentFonts } from "./fonts";

/**
 * A document element to PDF bytes. The element's Document must carry a fixed creationDate
 * (from the snapshot, never the clock): the PDF's file identifier is a digest of its info
 * dictionary, so a fixed date makes the same document the same bytes.
 */
export async function renderPdf(doc: ReactElement<DocumentProps>): Promise<Uint8Array> {
  registerDocumentFonts();
  const buffer = await renderToBuffer(doc);
  return new Uint8Array(buffer.buffer, buffer.byteOffset, buffer.byteLength);
}

/** The fixed creation date of a document: its event's time, or the epoch for a draft. */
export const documentDate = (iso: string | null) => new Date(iso ?? 0);
