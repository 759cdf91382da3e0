import type { Metadata } from "next";
import { RoomWorkspace } from "@/components/rooms/room-workspace";
import { requirePageActor } from "@/app/_lib/current-actor";
import { orNotFound } from "@/app/_lib/or-not-found";
import { roleMay } from "@/lib/permissions";
import { listBuildUps } from "@/lib/services/build-ups";
import { authorize } from "@/lib/services/guard";
import { listMaterials } from "@/lib/services/materials";
import { getRoom } from "@/lib/services/rooms";

export const metadata: Metadata = { title: "Room" };

export default async function RoomPage({ params }: { params: Promise<{ projectId: string; roomId: string }> }) {
  const { projectId, roomId } = await params;
  const actor = await requirePageActor();
  const room = orNotFound(() => getRoom(actor, projectId, roomId));
  const role = authorize(actor, projectId, "project.view").membership.role;
  return (
    <RoomWorkspace
      initial={room}
      materials={listMaterials(actor, projectId)}
      buildUps={listBuildUps(actor, projectId)}
      units={actor.unitPreference}
      mayEdit={roleMay(role, "design.edit")}
    />
  );
}
