import { AppError } from "@/lib/errors";
import { route } from "@/lib/http/route";
import { uploadAttachment } from "@/lib/services/attachments";

// multipart/form-data with "purpose" and "file".
export const POST = route<{ projectId: string }>(async ({ req, actor, params }) => {
  let form: FormData;
  try {
    form = await req.formData();
  } catch {
    throw new AppError("bad_request", "Send the upload as multipart/form-data with the fields purpose and file.");
  }
  const file = form.get("file");
  const bytes = file instanceof Blob ? new Uint8Array(await file.arrayBuffer()) : null;
  const name = file instanceof File ? file.name : "upload";
  return Response.json(uploadAttachment(actor, params.projectId, { purpose: form.get("purpose"), name, bytes }), { status: 201 });
});
