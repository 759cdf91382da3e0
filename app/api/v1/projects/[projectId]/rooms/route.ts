import { readJson, route } from "@/lib/http/route";
import { createRoom, listRooms } from "@/lib/services/rooms";

export const GET = route<{ projectId: string }>(({ actor, params }) => ({ rooms: listRooms(actor, params.projectId) }));
export const POST = route<{ projectId: string }>(async ({ req, actor, params }) =>
  Response.json(createRoom(actor, params.projectId, await readJson(req)), { status: 201 }),
);
