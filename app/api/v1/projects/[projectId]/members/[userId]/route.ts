import { route } from "@/lib/http/route";
import { removeMember } from "@/lib/services/members";

export const DELETE = route<{ projectId: string; userId: string }>(({ actor, params }) => removeMember(actor, params.projectId, params.userId));
