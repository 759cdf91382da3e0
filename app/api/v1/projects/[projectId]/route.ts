import { route } from "@/lib/http/route";
import { getProjectOverview } from "@/lib/services/projects";

export const GET = route<{ projectId: string }>(({ actor, params }) => getProjectOverview(actor, params.projectId));
