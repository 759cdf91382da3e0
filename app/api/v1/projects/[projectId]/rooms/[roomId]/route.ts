import { route } from "@/lib/http/route";
import { deleteRoom, getRoom, setRoomFire, updateRoom } from "@/lib/services/rooms";

type P = { projectId: string; roomId: string };
export const GET = route<P>(({ actor, params }) => getRoom(actor, params.projectId, params.roomId));
// A room of 40 surfaces with 60 openings each: more than the default JSON ceiling.
export const PUT = route<P>(async ({ json, actor, params }) => updateRoom(actor, params.projectId, params.roomId, await json()), { maxBody: 1024 * 1024 });
export const DELETE = route<P>(({ actor, params }) => deleteRoom(actor, params.projectId, params.roomId));
// The room's required fire class: { fireRequired: "B-s1,d0" | "Class A" | null }.
export const PATCH = route<P>(async ({ json, actor, params }) => setRoomFire(actor, params.projectId, params.roomId, await json()));
