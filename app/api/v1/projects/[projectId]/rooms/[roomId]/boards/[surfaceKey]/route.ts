import { readJson, route } from "@/lib/http/route";
import { getBoard, saveBoard } from "@/lib/services/boards";

type P = { projectId: string; roomId: string; surfaceKey: string };
export const GET = route<P>(({ actor, params }) => getBoard(actor, params.projectId, params.roomId, params.surfaceKey));
export const PUT = route<P>(async ({ req, actor, params }) => saveBoard(actor, params.projectId, params.roomId, params.surfaceKey, await readJson(req)));
