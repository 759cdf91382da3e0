import { route } from "@/lib/http/route";
import { setDrawing } from "@/lib/services/boards";

type P = { projectId: string; roomId: string; surfaceKey: string };
export const PUT = route<P>(async ({ json, actor, params }) => setDrawing(actor, params.projectId, params.roomId, params.surfaceKey, await json()));
