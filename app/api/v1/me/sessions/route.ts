import { route } from "@/lib/http/route";
import { endAllSessions, listMySessions } from "@/lib/services/sessions";

export const GET = route(({ actor }) => ({ sessions: listMySessions(actor) }));
// Sign out everywhere, this device included.
export const DELETE = route(({ actor }) => endAllSessions(actor));
