"use client";

import { queryOptions, useMutation, useQueryClient } from "@tanstack/react-query";
import type { RoomSummary, RoomView } from "@/lib/services/rooms";
import type { MaterialView } from "@/lib/services/materials";
import { api } from "./api";
import { keys } from "./keys";

const base = (projectId: string) => `/api/v1/projects/${encodeURIComponent(projectId)}`;

export const roomsQuery = (projectId: string) =>
  queryOptions({ queryKey: keys.rooms(projectId), queryFn: () => api<{ rooms: RoomSummary[] }>(`${base(projectId)}/rooms`).then((r) => r.rooms) });

export const roomQuery = (projectId: string, roomId: string) =>
  queryOptions({ queryKey: keys.room(projectId, roomId), queryFn: () => api<RoomView>(`${base(projectId)}/rooms/${encodeURIComponent(roomId)}`) });

export const materialsQuery = (projectId: string) =>
  queryOptions({
    queryKey: ["projects", projectId, "materials"] as const,
    queryFn: () => api<{ materials: MaterialView[] }>(`${base(projectId)}/materials`).then((r) => r.materials),
  });

export function useCreateRoom(projectId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: unknown) => api<RoomView>(`${base(projectId)}/rooms`, { method: "POST", body: input }),
    onSuccess: () => qc.invalidateQueries({ queryKey: keys.rooms(projectId) }),
  });
}

export function useSaveRoom(projectId: string, roomId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: unknown) => api<RoomView>(`${base(projectId)}/rooms/${encodeURIComponent(roomId)}`, { method: "PUT", body: input }),
    onSuccess: (saved) => {
      qc.setQueryData(keys.room(projectId, roomId), saved);
      return qc.invalidateQueries({ queryKey: keys.rooms(projectId) });
    },
  });
}

export function useCreateMaterial(projectId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: unknown) => api<MaterialView>(`${base(projectId)}/materials`, { method: "POST", body: input }),
    onSuccess: () => qc.invalidateQueries({ queryKey: ["projects", projectId, "materials"] }),
  });
}
