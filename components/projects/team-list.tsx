"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import type { TeamMember } from "@/lib/services/projects";
import { useRemoveMember } from "@/lib/queries/projects";
import { ApiError } from "@/lib/queries/api";
import { ROLE_WORDS } from "@/lib/permissions";
import { Button } from "@/components/ui/button";
import { RoleBadge } from "@/components/ui/role-badge";
import { Sheet } from "@/components/ui/sheet";

type Props = { projectId: string; team: TeamMember[]; mayRemove: boolean; myUserId: string | null };

// The project team. A consultant can take someone off the project after a confirmation; the
// only consultant cannot be removed (the server refuses, and the button is not offered).
export function TeamList({ projectId, team, mayRemove, myUserId }: Props) {
  const router = useRouter();
  const remove = useRemoveMember(projectId);
  const [asking, setAsking] = useState<string | null>(null);
  const consultants = team.filter((m) => m.role === "consultant").length;
  const err = remove.error instanceof ApiError ? remove.error : null;

  async function confirm(m: TeamMember) {
    const res = await remove.mutateAsync(m.userId).catch(() => null);
    if (!res) return;
    setAsking(null);
    if (res.self) {
      router.replace("/projects");
      router.refresh();
    }
  }

  return (
    <Sheet title="Team" aside={<span className="figures text-xs text-ink-faint">{team.length}</span>}>
      {err && (
        <p role="alert" className="mb-2 text-sm text-fault">
          {err.message}
        </p>
      )}
      <ul className="flex flex-col divide-y divide-ink/10" data-testid="team-list">
        {team.map((m) => {
          const removable = mayRemove && !(m.role === "consultant" && consultants <= 1);
          const you = m.userId === myUserId;
          return (
            <li key={m.userId} className="py-2.5">
              <div className="flex items-center justify-between gap-3">
                <span className="min-w-0">
                  <span className="block text-sm font-medium">
                    {m.name}
                    {you && <span className="ml-2 text-[11px] uppercase tracking-wider text-ink-faint">you</span>}
                  </span>
                  <span className="block truncate text-xs text-ink-faint">{m.email}</span>
                </span>
                <span className="flex shrink-0 items-center gap-2">
                  <RoleBadge role={m.role} />
                  {removable && asking !== m.userId && (
                    <button
                      type="button"
                      className="text-xs text-ink-soft underline-offset-2 hover:text-fault hover:underline"
                      onClick={() => setAsking(m.userId)}
                      aria-label={`Remove ${m.name} from the project`}
                    >
                      Remove
                    </button>
                  )}
                </span>
              </div>
              {asking === m.userId && (
                <div className="mt-2 rounded-sheet border border-fault/40 bg-fault-soft/40 p-3 text-sm">
                  <p>
                    {you ? "Leave this project?" : `Remove ${m.name} (${ROLE_WORDS[m.role].toLowerCase()}) from this project?`} Their pins and replies stay,
                    under their name; they are told by e-mail.
                  </p>
                  <div className="mt-2 flex gap-2">
                    <Button tone="danger" className="text-xs" onClick={() => confirm(m)} disabled={remove.isPending}>
                      {remove.isPending ? "Removing…" : you ? "Leave the project" : "Remove from project"}
                    </Button>
                    <Button tone="quiet" className="text-xs" onClick={() => setAsking(null)}>
                      Cancel
                    </Button>
                  </div>
                </div>
              )}
            </li>
          );
        })}
      </ul>
    </Sheet>
  );
}
