import type { Metadata } from "next";
import { RoomList } from "@/components/rooms/room-list";
import { requirePageActor } from "@/app/_lib/current-actor";
import { orNotFound } from "@/app/_lib/or-not-found";
import { roleMay } from "@/lib/permissions";
import { authorize } from "@/lib/services/guard";
import { listRooms } from "@/lib/services/rooms";

export const metadata: Metadata = { title: "Rooms" };

export default async function RoomsPage({ params }: { params: Promise<{ projectId: string }> }) {
  const { projectId } = await params;
  const actor = await requirePageActor();
  const rooms = orNotFound(() => listRooms(actor, projectId));
  const role = authorize(actor, projectId, "project.view").membership.role;
  return <RoomList projectId={projectId} initial={rooms} mayEdit={roleMay(role, "design.edit")} units={actor.unitPreference} />;
}
