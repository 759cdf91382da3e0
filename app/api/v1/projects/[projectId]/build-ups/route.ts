import { route } from "@/lib/http/route";
import { createBuildUp, listBuildUps } from "@/lib/services/build-ups";

export const GET = route<{ projectId: string }>(({ actor, params }) => ({ buildUps: listBuildUps(actor, params.projectId) }));
export const POST = route<{ projectId: string }>(async ({ json, actor, params }) =>
  Response.json(createBuildUp(actor, params.projectId, await json()), { status: 201 }),
);
