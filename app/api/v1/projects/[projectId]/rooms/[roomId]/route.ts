import { readJson, route } from "@/lib/http/route";
import { deleteRoom, getRoom, setRoomFire, updateRoom } from "@/lib/services/rooms";

type P = { projectId: string; roomId: string };
export const GET = route<P>(({ actor, params }) => getRoom(actor, params.projectId, params.roomId));
export const PUT = route<P>(async ({ req, actor, params }) => updateRoom(actor, params.projectId, params.roomId, await readJson(req)));
export const DELETE = route<P>(({ actor, params }) => deleteRoom(actor, params.projectId, params.roomId));
// The room's required fire class: { fireRequired: "B-s1,d0" | "Class A" | null }.
export const PATCH = route<P>(async ({ req, actor, params }) => setRoomFire(actor, params.projectId, params.roomId, await readJson(req)));
