import { route } from "@/lib/http/route";
import { getSubmittal } from "@/lib/services/submittals";

export const GET = route<{ projectId: string; submittalId: string }>(({ actor, params }) => getSubmittal(actor, params.projectId, params.submittalId));
