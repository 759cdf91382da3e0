import { route } from "@/lib/http/route";
import { describeInvitation } from "@/lib/services/invitations";

export const GET = route<{ token: string }>(({ params }) => describeInvitation(params.token));
