import { route } from "@/lib/http/route";
import { inviteToProject, listOpenInvitations } from "@/lib/services/invitations";

export const GET = route<{ projectId: string }>(({ actor, params }) => ({ invitations: listOpenInvitations(actor, params.projectId) }));
export const POST = route<{ projectId: string }>(async ({ json, actor, params }) =>
  Response.json(await inviteToProject(actor, params.projectId, await json()), { status: 201 }),
);
