"use client";

import { queryOptions, useMutation, useQueryClient } from "@tanstack/react-query";
import type { Me } from "@/lib/services/settings";
import type { getFirmAccounts } from "@/lib/services/firm";
import type { UpdateSettingsInput } from "@/lib/schemas/settings";
import type { InviteToFirmInput } from "@/lib/schemas/invitation";
import { api } from "./api";
import { keys } from "./keys";

export type FirmView = ReturnType<typeof getFirmAccounts>;

export const meQuery = () => queryOptions({ queryKey: keys.me, queryFn: () => api<Me>("/api/v1/me") });
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
