import { route } from "@/lib/http/route";
import { inviteToFirm } from "@/lib/services/invitations";

export const POST = route(async ({ json, actor }) => Response.json(await inviteToFirm(actor, await json()), { status: 201 }));
