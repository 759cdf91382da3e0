import { route } from "@/lib/http/route";
import { listTeam } from "@/lib/services/projects";

export const GET = route<{ projectId: string }>(({ actor, params }) => ({ members: listTeam(actor, params.projectId) }));
