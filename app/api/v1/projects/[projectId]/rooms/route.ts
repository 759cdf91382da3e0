import { route } from "@/lib/http/route";
import { createRoom, listRooms } from "@/lib/services/rooms";

export const GET = route<{ projectId: string }>(({ actor, params }) => ({ rooms: listRooms(actor, params.projectId) }));
export const POST = route<{ projectId: string }>(
  async ({ json, actor, params }) => Response.json(createRoom(actor, params.projectId, await json()), { status: 201 }),
  { maxBody: 1024 * 1024 }, // as for saving a room
);
