"use client";

import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { BoardView } from "@/lib/services/boards";
import { api } from "./api";

export const boardKey = (projectId: string, roomId: string, surfaceKey: string) => ["projects", projectId, "rooms", roomId, "boards", surfaceKey] as const;

const boardPath = (b: { projectId: string; roomId: string; surfaceKey: string }) =>
  `/api/v1/projects/${encodeURIComponent(b.projectId)}/rooms/${encodeURIComponent(b.roomId)}/boards/${encodeURIComponent(b.surfaceKey)}`;

export const fetchBoard = (b: { projectId: string; roomId: string; surfaceKey: string }) => api<BoardView>(boardPath(b));
export const putBoard = (b: { projectId: string; roomId: string; surfaceKey: string }, body: unknown) => api<BoardView>(boardPath(b), { method: "PUT", body });
export const putDrawing = (b: { projectId: string; roomId: string; surfaceKey: string }, body: unknown) => api<BoardView>(`${boardPath(b)}/drawing`, { method: "PUT", body });

export function usePinActions(b: { projectId: string; roomId: string; surfaceKey: string }, onChanged: () => void) {
  const qc = useQueryClient();
  const done = () => {
    onChanged();
    return qc.invalidateQueries({ queryKey: ["projects", b.projectId, "rooms"] });
  };
  const create = useMutation({ mutationFn: (body: { x: number; y: number; body: string }) => api<{ id: string; number: number }>(`${boardPath(b)}/pins`, { method: "POST", body }), onSuccess: done });
  const reply = useMutation({
    mutationFn: ({ pinId, body }: { pinId: string; body: string }) => api(`/api/v1/projects/${encodeURIComponent(b.projectId)}/pins/${encodeURIComponent(pinId)}/replies`, { method: "POST", body: { body } }),
    onSuccess: done,
  });
  const resolve = useMutation({
    mutationFn: ({ pinId, resolved }: { pinId: string; resolved: boolean }) => api(`/api/v1/projects/${encodeURIComponent(b.projectId)}/pins/${encodeURIComponent(pinId)}/resolve`, { method: "POST", body: { resolved } }),
    onSuccess: done,
  });
  return { create, reply, resolve };
}
