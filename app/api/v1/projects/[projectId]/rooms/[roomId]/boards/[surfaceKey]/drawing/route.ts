import { readJson, route } from "@/lib/http/route";
import { setDrawing } from "@/lib/services/boards";

type P = { projectId: string; roomId: string; surfaceKey: string };
export const PUT = route<P>(async ({ req, actor, params }) => setDrawing(actor, params.projectId, params.roomId, params.surfaceKey, await readJson(req)));
