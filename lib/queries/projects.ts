"use client";

import { queryOptions, useMutation, useQueryClient } from "@tanstack/react-query";
import type { ProjectListItem, ProjectOverview } from "@/lib/services/projects";
import type { InvitationSummary } from "@/lib/services/invitations";
import type { CreateProjectInput } from "@/lib/schemas/project";
import type { InviteToProjectInput } from "@/lib/schemas/invitation";
import { api } from "./api";
import { keys } from "./keys";

export const projectsQuery = () =>
  queryOptions({
    queryKey: keys.projects,
    queryFn: () => api<{ projects: ProjectListItem[] }>("/api/v1/projects").then((r) => r.projects),
  });

export const projectQuery = (id: string) =>
  queryOptions({
    queryKey: keys.project(id),
    queryFn: () => api<ProjectOverview>(`/api/v1/projects/${encodeURIComponent(id)}`),
  });

export function useCreateProject() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: Partial<CreateProjectInput>) => api<ProjectListItem>("/api/v1/projects", { method: "POST", body: input }),
    onSuccess: () => qc.invalidateQueries({ queryKey: keys.projects }),
  });
}

type InviteResult = { invitation: InvitationSummary; delivery: { status: "sent" | "failed"; error?: string } };

export function useInvite(projectId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: Partial<InviteToProjectInput>) =>
      api<InviteResult>(`/api/v1/projects/${encodeURIComponent(projectId)}/invitations`, { method: "POST", body: input }),
    onSuccess: () => qc.invalidateQueries({ queryKey: keys.project(projectId) }),
  });
}

export function useRevokeInvitation(projectId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (invitationId: string) =>
      api(`/api/v1/projects/${encodeURIComponent(projectId)}/invitations/${encodeURIComponent(invitationId)}`, { method: "DELETE" }),
    // Optimistic: the row leaves the list at once and comes back if the server refuses.
    onMutate: async (invitationId) => {
      await qc.cancelQueries({ queryKey: keys.project(projectId) });
      const before = qc.getQueryData<ProjectOverview>(keys.project(projectId));
      if (before?.invitations) {
        qc.setQueryData<ProjectOverview>(keys.project(projectId), {
          ...before,
          invitations: before.invitations.filter((i) => i.id !== invitationId),
        });
      }
      return { before };
    },
    onError: (_e, _id, ctx) => ctx?.before && qc.setQueryData(keys.project(projectId), ctx.before),
    onSettled: () => qc.invalidateQueries({ queryKey: keys.project(projectId) }),
  });
}

export function useUpdateProject(projectId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: Record<string, unknown>) => api<ProjectOverview>(`/api/v1/projects/${encodeURIComponent(projectId)}`, { method: "PATCH", body: input }),
    onSuccess: (next) => qc.setQueryData(keys.project(projectId), next),
  });
}

export function useRemoveMember(projectId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (userId: string) =>
      api<{ removed: string; self: boolean }>(`/api/v1/projects/${encodeURIComponent(projectId)}/members/${encodeURIComponent(userId)}`, { method: "DELETE" }),
    // Someone who removed themselves can no longer read the project: refresh only the list.
    onSuccess: (res) =>
      Promise.all([res.self ? qc.removeQueries({ queryKey: keys.project(projectId) }) : qc.invalidateQueries({ queryKey: keys.project(projectId) }), qc.invalidateQueries({ queryKey: keys.projects })]),
  });
}
