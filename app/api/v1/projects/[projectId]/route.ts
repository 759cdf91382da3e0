import { readJson, route } from "@/lib/http/route";
import { getProjectOverview, updateProject } from "@/lib/services/projects";

export const GET = route<{ projectId: string }>(({ actor, params }) => getProjectOverview(actor, params.projectId));
export const PATCH = route<{ projectId: string }>(async ({ actor, params, req }) => updateProject(actor, params.projectId, await readJson(req)));
