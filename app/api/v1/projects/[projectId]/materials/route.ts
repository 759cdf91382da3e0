import { route } from "@/lib/http/route";
import { createProjectMaterial, listMaterials } from "@/lib/services/materials";

export const GET = route<{ projectId: string }>(({ actor, params }) => ({ materials: listMaterials(actor, params.projectId) }));
export const POST = route<{ projectId: string }>(async ({ json, actor, params }) =>
  Response.json(createProjectMaterial(actor, params.projectId, await json()), { status: 201 }),
);
