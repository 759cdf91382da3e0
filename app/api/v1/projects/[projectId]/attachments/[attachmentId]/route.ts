import { downloadHeaders } from "@/lib/http/download";
import { route } from "@/lib/http/route";
import { readAttachment } from "@/lib/services/attachments";

export const GET = route<{ projectId: string; attachmentId: string }>(({ actor, params }) => {
  const { name, mime, bytes } = readAttachment(actor, params.projectId, params.attachmentId);
  return new Response(new Uint8Array(bytes), { headers: downloadHeaders({ name, mime, size: bytes.byteLength }) });
});
