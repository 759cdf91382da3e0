import { fileResponse } from "@/lib/http/file-response";
import { route } from "@/lib/http/route";
import { readAttachment } from "@/lib/services/attachments";

export const GET = route<{ projectId: string; attachmentId: string }>(({ actor, params }) => {
  const { row, bytes } = readAttachment(actor, params.projectId, params.attachmentId);
  return fileResponse({ bytes, mime: row.mime, name: row.originalName });
});
