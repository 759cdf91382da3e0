import { route } from "@/lib/http/route";
import { acceptInvitation } from "@/lib/services/invitations";

export const POST = route<{ token: string }>(({ actor, params }) => acceptInvitation(actor, params.token));
