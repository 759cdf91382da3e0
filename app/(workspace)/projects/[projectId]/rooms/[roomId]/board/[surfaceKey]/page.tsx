import type { Metadata } from "next";
import { BoardScreen } from "@/components/board/board-screen";
import { requirePageActor } from "@/app/_lib/current-actor";
import { orNotFound } from "@/app/_lib/or-not-found";
import { roleMay } from "@/lib/permissions";
import { getBoard } from "@/lib/services/boards";
import { listBuildUps } from "@/lib/services/build-ups";
import { authorize } from "@/lib/services/guard";
import { listMaterials } from "@/lib/services/materials";
import { getRoom } from "@/lib/services/rooms";

export const metadata: Metadata = { title: "Board" };

export default async function BoardPage({ params, searchParams }: { params: Promise<{ projectId: string; roomId: string; surfaceKey: string }>; searchParams: Promise<{ pin?: string }> }) {
  const { projectId, roomId, surfaceKey } = await params;
  const { pin } = await searchParams;
  const actor = await requirePageActor();
  const board = orNotFound(() => getBoard(actor, projectId, roomId, surfaceKey));
  const role = authorize(actor, projectId, "project.view").membership.role;
  return (
    <BoardScreen
      initial={board}
      room={getRoom(actor, projectId, roomId)}
      materials={listMaterials(actor, projectId)}
      buildUps={listBuildUps(actor, projectId)}
      units={actor.unitPreference}
      may={{ edit: roleMay(role, "design.edit"), pin: roleMay(role, "pin.write"), resolve: roleMay(role, "pin.resolve"), drawing: roleMay(role, "drawing.upload") }}
      focusPin={pin ? Number(pin) : null}
    />
  );
}
