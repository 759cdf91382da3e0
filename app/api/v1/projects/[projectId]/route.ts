import { route } from "@/lib/http/route";
import { getProjectOverview, updateProject } from "@/lib/services/projects";

export const GET = route<{ projectId: string }>(({ actor, params }) => getProjectOverview(actor, params.projectId));
export const PATCH = route<{ projectId: string }>(async ({ json, actor, params }) => updateProject(actor, params.projectId, await json()));
