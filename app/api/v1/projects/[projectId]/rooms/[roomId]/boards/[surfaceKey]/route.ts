import { route } from "@/lib/http/route";
import { getBoard, saveBoard } from "@/lib/services/boards";

type P = { projectId: string; roomId: string; surfaceKey: string };
export const GET = route<P>(({ actor, params }) => getBoard(actor, params.projectId, params.roomId, params.surfaceKey));
// Up to 3000 panels: more than the default JSON ceiling.
export const PUT = route<P>(async ({ json, actor, params }) => saveBoard(actor, params.projectId, params.roomId, params.surfaceKey, await json()), { maxBody: 2 * 1024 * 1024 });
