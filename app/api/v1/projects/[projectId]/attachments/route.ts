import { route } from "@/lib/http/route";
import { uploadAttachment } from "@/lib/services/attachments";

// multipart/form-data with "purpose" and "file", read within the upload limit.
export const POST = route<{ projectId: string }>(async ({ form, actor, params }) => {
  const body = await form();
  const file = body.get("file");
  const bytes = file instanceof Blob ? new Uint8Array(await file.arrayBuffer()) : null;
  const name = file instanceof File ? file.name : "upload";
  return Response.json(uploadAttachment(actor, params.projectId, { purpose: body.get("purpose"), name, bytes }), { status: 201 });
});
