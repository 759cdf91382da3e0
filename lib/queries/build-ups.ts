"use client";

import { queryOptions, useMutation, useQueryClient } from "@tanstack/react-query";
import type { BuildUpView } from "@/lib/services/build-ups";
import type { AttachmentSummary } from "@/lib/services/attachments";
import { api, postForm } from "./api";
import { keys } from "./keys";

const base = (projectId: string) => `/api/v1/projects/${encodeURIComponent(projectId)}/build-ups`;

export const buildUpsQuery = (projectId: string) =>
  queryOptions({
    queryKey: keys.buildUps(projectId),
    queryFn: () => api<{ buildUps: BuildUpView[] }>(base(projectId)).then((r) => r.buildUps),
  });

export function useCreateBuildUp(projectId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: unknown) => api<BuildUpView>(base(projectId), { method: "POST", body: input }),
    onSuccess: () => qc.invalidateQueries({ queryKey: keys.buildUps(projectId) }),
  });
}

export function useSaveBuildUp(projectId: string, buildUpId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: unknown) => api<BuildUpView>(`${base(projectId)}/${encodeURIComponent(buildUpId)}`, { method: "PUT", body: input }),
    onSuccess: (saved) => {
      qc.setQueryData<BuildUpView[]>(keys.buildUps(projectId), (list) => list?.map((b) => (b.id === saved.id ? saved : b)));
      return qc.invalidateQueries({ queryKey: keys.buildUps(projectId) });
    },
  });
}

export function useDeleteBuildUp(projectId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (buildUpId: string) => api(`${base(projectId)}/${encodeURIComponent(buildUpId)}`, { method: "DELETE" }),
    onSuccess: () => qc.invalidateQueries({ queryKey: keys.buildUps(projectId) }),
  });
}

export async function fetchBuildUp(projectId: string, buildUpId: string): Promise<BuildUpView> {
  return api<BuildUpView>(`${base(projectId)}/${encodeURIComponent(buildUpId)}`);
}

export async function uploadFile(projectId: string, purpose: string, file: File): Promise<AttachmentSummary> {
  const form = new FormData();
  form.set("purpose", purpose);
  form.set("file", file);
  return postForm<AttachmentSummary>(`/api/v1/projects/${encodeURIComponent(projectId)}/attachments`, form);
}
