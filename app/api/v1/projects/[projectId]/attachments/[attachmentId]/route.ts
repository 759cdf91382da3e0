import { downloadResponse } from "@/lib/http/download";
import { route } from "@/lib/http/route";
import { readAttachment } from "@/lib/services/attachments";

export const GET = route<{ projectId: string; attachmentId: string }>(({ actor, params }) => {
  const { name, mime, bytes } = readAttachment(actor, params.projectId, params.attachmentId);
  return downloadResponse({ bytes, name, mime });
});
