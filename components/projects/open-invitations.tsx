"use client";

import type { InvitationSummary } from "@/lib/services/invitations";
import { useRevokeInvitation } from "@/lib/queries/projects";
import { RoleBadge } from "@/components/ui/role-badge";

export function OpenInvitations({ projectId, invitations }: { projectId: string; invitations: InvitationSummary[] }) {
  const revoke = useRevokeInvitation(projectId);
  if (invitations.length === 0) return null;
  return (
    <div className="mt-6 border-t border-ink/15 pt-4">
      <h3 className="text-xs font-semibold uppercase tracking-wider text-ink-soft">Waiting for an answer</h3>
      <ul className="mt-2 flex flex-col gap-2" data-testid="open-invitations">
        {invitations.map((i) => (
          <li key={i.id} className="flex items-center justify-between gap-2 text-sm">
            <span className="min-w-0">
              <span className="block truncate">{i.email}</span>
              <span className="block text-xs text-ink-faint">until {new Date(i.expiresAt).toLocaleDateString("en-GB")}</span>
            </span>
            <span className="flex items-center gap-2">
              {i.role && <RoleBadge role={i.role} />}
              <button type="button" className="text-xs text-fault underline-offset-2 hover:underline" onClick={() => revoke.mutate(i.id)}>
                Withdraw
              </button>
            </span>
          </li>
        ))}
      </ul>
    </div>
  );
}
