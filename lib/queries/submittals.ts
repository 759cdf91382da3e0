"use client";

import { queryOptions, useMutation, useQueryClient } from "@tanstack/react-query";
import type { InstalledPanel, IssueReadiness, SubmittalList, SubmittalView } from "@/lib/services/submittals";
import type { RoomView } from "@/lib/services/rooms";
import { api, postForm } from "./api";
import { keys } from "./keys";

const base = (projectId: string) => `/api/v1/projects/${encodeURIComponent(projectId)}`;
const one = (projectId: string, id: string) => `${base(projectId)}/submittals/${encodeURIComponent(id)}`;

export const submittalsQuery = (projectId: string) => queryOptions({ queryKey: keys.submittals(projectId), queryFn: () => api<SubmittalList>(`${base(projectId)}/submittals`) });

export const submittalQuery = (projectId: string, id: string) => queryOptions({ queryKey: keys.submittal(projectId, id), queryFn: () => api<SubmittalView>(one(projectId, id)) });

export const readinessQuery = (projectId: string, roomId: string) =>
  queryOptions({ queryKey: [...keys.submittals(projectId), "readiness", roomId] as const, queryFn: () => api<IssueReadiness>(`${base(projectId)}/rooms/${encodeURIComponent(roomId)}/readiness`), staleTime: 0 });

export function useIssue(projectId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: { roomId: string; letter: string; confirm: string[] }) => api<{ id: string; letter: string }>(`${base(projectId)}/submittals`, { method: "POST", body }),
    onSettled: () => qc.invalidateQueries({ queryKey: keys.submittals(projectId) }),
  });
}

export function useDecide(projectId: string, id: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: { outcome: string; signature: string; notes: string; pdfSha256: string }) => api<{ id: string; state: string }>(`${one(projectId, id)}/decision`, { method: "POST", body }),
    onSettled: () => qc.invalidateQueries({ queryKey: keys.submittals(projectId) }),
  });
}

/** Install marks and site photos: each answer is put into the revision's cached view at once. */
export function useInstallActions(projectId: string, id: string) {
  const qc = useQueryClient();
  const put = (panel: InstalledPanel) => {
    qc.setQueryData<SubmittalView>(keys.submittal(projectId, id), (view) =>
      view?.install ? { ...view, install: { ...view.install, placements: view.install.placements.map((p) => (p.id === panel.placementId ? { ...p, ...panel } : p)) } } : view,
    );
    return qc.invalidateQueries({ queryKey: keys.submittals(projectId) });
  };
  const mark = useMutation({
    mutationFn: ({ placementId, installed }: { placementId: string; installed: boolean }) =>
      api<InstalledPanel>(`${one(projectId, id)}/placements/${encodeURIComponent(placementId)}`, { method: "PUT", body: { installed } }),
    onSuccess: put,
  });
  const photo = useMutation({
    mutationFn: ({ placementId, file }: { placementId: string; file: File }) => {
      const form = new FormData();
      form.set("file", file);
      return postForm<InstalledPanel>(`${one(projectId, id)}/placements/${encodeURIComponent(placementId)}/photo`, form);
    },
    onSuccess: put,
  });
  return { mark, photo };
}

export function useRoomFire(projectId: string, roomId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (fireRequired: string | null) => api<RoomView>(`${base(projectId)}/rooms/${encodeURIComponent(roomId)}`, { method: "PATCH", body: { fireRequired } }),
    onSuccess: (room) => qc.setQueryData(keys.room(projectId, roomId), room),
  });
}
