import { route } from "@/lib/http/route";
import { replyToPin } from "@/lib/services/boards";

export const POST = route<{ projectId: string; pinId: string }>(async ({ json, actor, params }) =>
  Response.json(await replyToPin(actor, params.projectId, params.pinId, await json()), { status: 201 }),
);
