import { uploadedFile } from "@/lib/http/body";
import { route } from "@/lib/http/route";
import { attachSitePhoto } from "@/lib/services/submittals";

// A site photo of one panel: multipart/form-data with the field "file", read within the upload limit.
export const POST = route<{ projectId: string; submittalId: string; placementId: string }>(async ({ form, actor, params }) =>
  Response.json(await attachSitePhoto(actor, params.projectId, params.submittalId, params.placementId, await uploadedFile(await form(), "photo")), { status: 201 }),
);
