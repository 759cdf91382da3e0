import { uploadedFile } from "@/lib/http/body";
import { route } from "@/lib/http/route";
import { uploadAttachment } from "@/lib/services/attachments";

// multipart/form-data with "purpose" and "file", read within the upload limit.
export const POST = route<{ projectId: string }>(async ({ form, actor, params }) => {
  const body = await form();
  const { name, bytes } = await uploadedFile(body, "upload");
  return Response.json(uploadAttachment(actor, params.projectId, { purpose: body.get("purpose"), name, bytes }), { status: 201 });
});
