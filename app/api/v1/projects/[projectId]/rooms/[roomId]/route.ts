import { readJson, route } from "@/lib/http/route";
import { deleteRoom, getRoom, updateRoom } from "@/lib/services/rooms";

type P = { projectId: string; roomId: string };
export const GET = route<P>(({ actor, params }) => getRoom(actor, params.projectId, params.roomId));
export const PUT = route<P>(async ({ req, actor, params }) => updateRoom(actor, params.projectId, params.roomId, await readJson(req)));
export const DELETE = route<P>(({ actor, params }) => deleteRoom(actor, params.projectId, params.roomId));
