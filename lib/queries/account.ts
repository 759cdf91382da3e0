"use client";

import { queryOptions, useMutation, useQueryClient } from "@tanstack/react-query";
import type { Me } from "@/lib/services/settings";
import type { getFirmAccounts } from "@/lib/services/firm";
import type { UpdateSettingsInput } from "@/lib/schemas/settings";
import type { InviteSignUpInput, InviteToFirmInput } from "@/lib/schemas/invitation";
import type { ChangePasswordInput, CompletePasswordResetInput, RequestPasswordResetInput } from "@/lib/schemas/account";
import type { FirmAccount } from "@/lib/services/firm";
import type { SessionView } from "@/lib/services/sessions";
import { api } from "./api";
import { keys } from "./keys";

export type FirmView = ReturnType<typeof getFirmAccounts>;

export const meQuery = () => queryOptions({ queryKey: keys.me, queryFn: () => api<Me>("/api/v1/me") });
export const sessionsQuery = () =>
  queryOptions({ queryKey: keys.sessions, queryFn: () => api<{ sessions: SessionView[] }>("/api/v1/me/sessions").then((r) => r.sessions) });
export const firmQuery = () => queryOptions({ queryKey: keys.firm, queryFn: () => api<FirmView>("/api/v1/firm/accounts") });

export function useUpdateSettings() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: Partial<UpdateSettingsInput>) => api<Me>("/api/v1/me", { method: "PATCH", body: input }),
    onSuccess: (me) => {
      qc.setQueryData(keys.me, me);
      // Every screen formats lengths by the preference: refetch what is on screen.
      return qc.invalidateQueries();
    },
  });
}

export function useInviteToFirm() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: Partial<InviteToFirmInput>) => api("/api/v1/firm/invitations", { method: "POST", body: input }),
    onSuccess: () => qc.invalidateQueries({ queryKey: keys.firm }),
  });
}

export function useAcceptInvitation(token: string) {
  return useMutation({
    mutationFn: () => api<{ projectId: string | null }>(`/api/v1/invitations/${encodeURIComponent(token)}/accept`, { method: "POST" }),
  });
}

export function useCreateInvitedAccount(token: string) {
  return useMutation({
    mutationFn: (input: Partial<InviteSignUpInput>) =>
      api<{ email: string; projectId: string | null }>(`/api/v1/invitations/${encodeURIComponent(token)}/account`, { method: "POST", body: input }),
  });
}

export function useRequestPasswordReset() {
  return useMutation({
    mutationFn: (input: Partial<RequestPasswordResetInput>) => api<{ message: string }>("/api/v1/password-reset", { method: "POST", body: input }),
  });
}

export function useCompletePasswordReset(token: string) {
  return useMutation({
    mutationFn: (input: Partial<CompletePasswordResetInput>) =>
      api<{ reset: true }>(`/api/v1/password-reset/${encodeURIComponent(token)}`, { method: "POST", body: input }),
  });
}

export function useChangePassword() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: Partial<ChangePasswordInput>) =>
      api<{ changed: true; otherSessionsEnded: number }>("/api/v1/me/password", { method: "POST", body: input }),
    onSuccess: () => qc.invalidateQueries({ queryKey: keys.sessions }),
  });
}

export function useEndSession() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (sessionId: string) => api<{ ended: number; current: boolean }>(`/api/v1/me/sessions/${encodeURIComponent(sessionId)}`, { method: "DELETE" }),
    onSuccess: () => qc.invalidateQueries({ queryKey: keys.sessions }),
  });
}

export function useEndAllSessions() {
  return useMutation({ mutationFn: () => api<{ ended: number }>("/api/v1/me/sessions", { method: "DELETE" }) });
}

export function useSetAccountDisabled() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, disabled }: { userId: string; disabled: boolean }) =>
      api<FirmAccount>(`/api/v1/firm/accounts/${encodeURIComponent(userId)}`, { method: "PATCH", body: { disabled } }),
    onSuccess: () => qc.invalidateQueries({ queryKey: keys.firm }),
  });
}
