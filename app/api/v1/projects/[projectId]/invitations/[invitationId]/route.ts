import { route } from "@/lib/http/route";
import { revokeInvitation } from "@/lib/services/invitations";

export const DELETE = route<{ projectId: string; invitationId: string }>(({ actor, params }) =>
  revokeInvitation(actor, params.projectId, params.invitationId),
);
