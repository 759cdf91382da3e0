import { route } from "@/lib/http/route";
import { issueReadiness } from "@/lib/services/submittals";

// What issuing this room's next revision asks to be confirmed, and the letter it will carry.
export const GET = route<{ projectId: string; roomId: string }>(({ actor, params }) => issueReadiness(actor, params.projectId, params.roomId));
