import { readJson, route } from "@/lib/http/route";
import { replyToPin } from "@/lib/services/boards";

export const POST = route<{ projectId: string; pinId: string }>(async ({ req, actor, params }) =>
  Response.json(await replyToPin(actor, params.projectId, params.pinId, await readJson(req)), { status: 201 }),
);
