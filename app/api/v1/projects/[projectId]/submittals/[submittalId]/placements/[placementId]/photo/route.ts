import { route } from "@/lib/http/route";
import { attachSitePhoto } from "@/lib/services/submittals";

// A site photo of one panel: multipart/form-data with the field "file", read within the upload limit.
export const POST = route<{ projectId: string; submittalId: string; placementId: string }>(async ({ form, actor, params }) => {
  const body = await form();
  const file = body.get("file");
  const bytes = file instanceof Blob ? new Uint8Array(await file.arrayBuffer()) : null;
  const name = file instanceof File ? file.name : "photo";
  return Response.json(await attachSitePhoto(actor, params.projectId, params.submittalId, params.placementId, { name, bytes }), { status: 201 });
});
