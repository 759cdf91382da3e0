import { route } from "@/lib/http/route";
import { endSession } from "@/lib/services/sessions";

export const DELETE = route<{ sessionId: string }>(({ actor, params }) => endSession(actor, params.sessionId));
