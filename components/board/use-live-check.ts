"use client";

import { useLayoutEffect, useMemo } from "react";
import type { RoomView } from "@/lib/services/rooms";
import type { MaterialView } from "@/lib/services/materials";
import type { BuildUpView } from "@/lib/services/build-ups";
import type { BoardSurface, Placement } from "@/lib/board/types";
import { countSurface, linesOf } from "@/lib/board/treated-area";
import { runCheck, surfacesFor, type PanelAlpha } from "@/lib/room-model";
import { octaveAlphaFromBands } from "@/lib/rooms/octaves";
import { boardStats } from "./use-board-editor";

type Args = { room: RoomView; materials: MaterialView[]; buildUps: BuildUpView[]; surfaceKey: string; surface: BoardSurface; placements: readonly Placement[] };

// The room's check beside the board. The build-ups' band values and the room's other surfaces
// are worked out once; each frame of a drag only recounts this board's area and re-sums the
// room. This board counts only what can exist (lib/board/treated-area.ts), as the saved
// check does.
export function useLiveCheck({ room, materials, buildUps, surfaceKey, surface, placements }: Args) {
  const panels = useMemo(() => new Map<string, PanelAlpha>(buildUps.map((b) => [b.id, { name: b.name, alpha: octaveAlphaFromBands(b.result.octaves) }])), [buildUps]);
  const lookup = useMemo(() => {
    const byKey = new Map(materials.map((m) => [m.key, m.alpha]));
    return (key: string) => byKey.get(key);
  }, [materials]);
  const roomFields = useMemo(() => ({ ...room, surfaces: room.surfaces.map(({ grossArea: _g, netArea: _n, ...s }) => s) }), [room]);
  const roomSurfaces = useMemo(() => surfacesFor(roomFields), [roomFields]);
  const otherBoards = useMemo(() => room.placed.filter((l) => l.surfaceKey !== surfaceKey), [room.placed, surfaceKey]);
  const count = useMemo(() => countSurface(surface, placements), [surface, placements]);
  const check = useMemo(
    () => runCheck({ fields: roomFields, surfaces: roomSurfaces, treatments: [...room.treatments, ...otherBoards, ...linesOf(surfaceKey, count)], panels, lookup }).check,
    [count, roomFields, roomSurfaces, room.treatments, otherBoards, panels, lookup, surfaceKey],
  );
  useLayoutEffect(() => {
    boardStats().checkAt = performance.now();
  }, [check]);
  return { check, account: count.account };
}
