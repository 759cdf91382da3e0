import { and, eq } from "drizzle-orm";
import { getDb, transaction } from "@/db/client";
import { attachment, type Attachment } from "@/db/schema";
import { invalid, notFound } from "@/lib/errors";
import type { ProjectAction } from "@/lib/permissions";
import { fileNameFor, kindOfMime, readStoredFile, storeFile, type UploadKind } from "@/lib/storage";
import type { Actor } from "./actor";
import { authorize } from "./guard";
import { recordAudit } from "./audit";

// Who may upload and see each kind of upload, and what file types it takes.
const PURPOSES = {
  "test-report": { upload: "design.edit", view: "design.view", kinds: ["pdf"] },
  "fire-report": { upload: "design.edit", view: "design.view", kinds: ["pdf"] },
  drawing: { upload: "drawing.upload", view: "design.view", kinds: ["pdf", "png", "jpeg"] },
  photo: { upload: "install.record", view: "project.view", kinds: ["png", "jpeg", "webp"] },
} as const satisfies Record<Attachment["purpose"], { upload: ProjectAction; view: ProjectAction; kinds: readonly UploadKind[] }>;

export type AttachmentPurpose = keyof typeof PURPOSES;
export const isPurpose = (p: unknown): p is AttachmentPurpose => typeof p === "string" && Object.hasOwn(PURPOSES, p);

export type AttachmentSummary = { id: string; purpose: AttachmentPurpose; name: string; mime: string; size: number; url: string };

export const attachmentUrl = (projectId: string, id: string) => `/api/v1/projects/${projectId}/attachments/${id}`;

export function summarizeAttachment(a: Attachment): AttachmentSummary {
  return { id: a.id, purpose: a.purpose, name: a.originalName, mime: a.mime, size: a.size, url: attachmentUrl(a.projectId, a.id) };
}

export function uploadAttachment(
  actor: Actor | null,
  projectId: string,
  input: { purpose: unknown; name: string; bytes: Uint8Array | null },
): AttachmentSummary {
  if (!isPurpose(input.purpose)) {
    // The guard still goes first: an outsider learns nothing from a bad purpose.
    authorize(actor, projectId, "project.view");
    throw invalid([{ field: "purpose", message: "Choose what the file is: test-report, fire-report, drawing or photo." }]);
  }
  const rules = PURPOSES[input.purpose];
  const access = authorize(actor, projectId, rules.upload);
  if (!input.bytes) throw invalid([{ field: "file", message: "Choose a file to upload." }]);
  const stored = storeFile(input.bytes, rules.kinds);
  const name = fileNameFor(input.name, stored.kind);
  const row = transaction((tx) => {
    const row = tx
      .insert(attachment)
      .values({ projectId, purpose: input.purpose as AttachmentPurpose, sha256: stored.sha256, mime: stored.mime, size: stored.size, originalName: name, uploadedBy: access.actor.userId })
      .returning()
      .get();
    recordAudit(tx, { actorId: access.actor.userId, projectId, action: "attachment.uploaded", subjectId: row.id, detail: { purpose: row.purpose, sha256: row.sha256 } });
    return row;
  });
  return summarizeAttachment(row);
}

export function readAttachment(actor: Actor | null, projectId: string, attachmentId: string): { name: string; mime: string; bytes: Buffer } {
  authorize(actor, projectId, "project.view");
  const row = getDb()
    .select()
    .from(attachment)
    .where(and(eq(attachment.id, attachmentId), eq(attachment.projectId, projectId)))
    .get();
  if (!row) throw notFound("File");
  authorize(actor, projectId, PURPOSES[row.purpose].view);
  // Files stored before names were cleaned at upload get the same treatment on the way out.
  const kind = kindOfMime(row.mime);
  const name = kind ? fileNameFor(row.originalName, kind) : row.originalName;
  return { name, mime: row.mime, bytes: readStoredFile(row.sha256, row.mime) };
}

// For services that link an upload to something (a build-up's fire report, a material's test
// report): the attachment must belong to the project and be of the right purpose.
export function requireAttachment(projectId: string, attachmentId: string, purpose: AttachmentPurpose, field: string): Attachment {
  if (!attachmentId.trim()) throw invalid([{ field, message: "Choose a file, or send null for none." }]);
  const row = getDb()
    .select()
    .from(attachment)
    .where(and(eq(attachment.id, attachmentId), eq(attachment.projectId, projectId)))
    .get();
  if (!row || row.purpose !== purpose) throw invalid([{ field, message: `That file is not a ${purpose.replace("-", " ")} of this project.` }]);
  return row;
}
