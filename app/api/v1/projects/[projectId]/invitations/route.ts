import { readJson, route } from "@/lib/http/route";
import { inviteToProject, listOpenInvitations } from "@/lib/services/invitations";

export const GET = route<{ projectId: string }>(({ actor, params }) => ({ invitations: listOpenInvitations(actor, params.projectId) }));
export const POST = route<{ projectId: string }>(async ({ req, actor, params }) =>
  Response.json(await inviteToProject(actor, params.projectId, await readJson(req)), { status: 201 }),
);
