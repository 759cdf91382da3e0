import { route } from "@/lib/http/route";
import { projectProgress } from "@/lib/services/submittals";

export const GET = route<{ projectId: string }>(({ actor, params }) => projectProgress(actor, params.projectId));
