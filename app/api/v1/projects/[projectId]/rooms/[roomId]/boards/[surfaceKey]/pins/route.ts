import { route } from "@/lib/http/route";
import { createPin } from "@/lib/services/boards";

type P = { projectId: string; roomId: string; surfaceKey: string };
export const POST = route<P>(async ({ json, actor, params }) =>
  Response.json(await createPin(actor, params.projectId, params.roomId, params.surfaceKey, await json()), { status: 201 }),
);
