import { readJson, route } from "@/lib/http/route";
import { inviteToFirm } from "@/lib/services/invitations";

export const POST = route(async ({ req, actor }) => Response.json(await inviteToFirm(actor, await readJson(req)), { status: 201 }));
