import { AppError } from "@/lib/errors";
import { route } from "@/lib/http/route";
import { attachSitePhoto } from "@/lib/services/submittals";

// A site photo of one panel, multipart/form-data with the field "file".
export const POST = route<{ projectId: string; submittalId: string; placementId: string }>(async ({ req, actor, params }) => {
  let form: FormData;
  try {
    form = await req.formData();
  } catch {
    throw new AppError("bad_request", "Send the photo as multipart/form-data with the field file.");
  }
  const file = form.get("file");
  const bytes = file instanceof Blob ? new Uint8Array(await file.arrayBuffer()) : null;
  const name = file instanceof File ? file.name : "photo";
  return Response.json(await attachSitePhoto(actor, params.projectId, params.submittalId, params.placementId, { name, bytes }), { status: 201 });
});
