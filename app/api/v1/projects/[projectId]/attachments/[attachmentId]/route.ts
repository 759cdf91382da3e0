import { route } from "@/lib/http/route";
import { readAttachment } from "@/lib/services/attachments";

export const GET = route<{ projectId: string; attachmentId: string }>(({ actor, params }) => {
  const { row, bytes } = readAttachment(actor, params.projectId, params.attachmentId);
  return new Response(new Uint8Array(bytes), {
    headers: {
      "content-type": row.mime,
      "content-length": String(bytes.byteLength),
      "content-disposition": `inline; filename="${row.originalName}"`,
      "cache-control": "private, max-age=3600",
      "x-content-type-options": "nosniff",
    },
  });
});
