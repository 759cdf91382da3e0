import { and, eq } from "drizzle-orm";
import { getDb, type Tx } from "@/db/client";
import { submittalDocument, type SubmittalDocument, type SubmittalDocumentKind } from "@/db/schema";
import { readStoredFile, storeGenerated } from "@/lib/storage";
import type { UnitPreference } from "@/lib/units";

// A revision's documents: the bytes under the data folder by content hash (written before the
// transaction that records them, so a failed transaction leaves at most an unreferenced file),
// and a row that says which document of which revision they are.

export type RenderedDocument = { kind: SubmittalDocumentKind; units: UnitPreference; name: string; bytes: Uint8Array };
export type StoredDocument = Omit<RenderedDocument, "bytes"> & { mime: string; sha256: string; size: number };

export function writeDocument(doc: RenderedDocument): StoredDocument {
  const stored = storeGenerated(doc.bytes, doc.kind === "shop-pack" ? "zip" : "pdf");
  return { kind: doc.kind, units: doc.units, name: doc.name, mime: stored.mime, sha256: stored.sha256, size: stored.size };
}

export function recordDocument(tx: Tx, submittalId: string, doc: StoredDocument): void {
  tx.insert(submittalDocument).values({ submittalId, ...doc }).run();
}

export function documentsOf(submittalId: string): SubmittalDocument[] {
  return getDb().select().from(submittalDocument).where(eq(submittalDocument.submittalId, submittalId)).all();
}

export function findDocument(submittalId: string, kind: SubmittalDocumentKind, units?: UnitPreference): SubmittalDocument | undefined {
  const rows = getDb()
    .select()
    .from(submittalDocument)
    .where(and(eq(submittalDocument.submittalId, submittalId), eq(submittalDocument.kind, kind)))
    .all();
  return rows.find((r) => r.units === units) ?? rows[0];
}

export const documentBytes = (doc: SubmittalDocument) => readStoredFile(doc.sha256, doc.mime);
