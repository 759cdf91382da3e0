"use client";

import { useRouter } from "next/navigation";
import { useQuery } from "@tanstack/react-query";
import { useState } from "react";
import { readinessQuery, useIssue } from "@/lib/queries/submittals";
import { ApiError } from "@/lib/queries/api";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { Working } from "./working";

const KIND_WORDS = { rule: "Board rule", pin: "Open pin", fire: "Fire class" } as const;

// Issuing a room's next revision: what it would issue, each thing that asks for confirmation
// (broken board rules, open pins, fire flags) to be ticked, then the render with its progress.
export function IssuePanel({ projectId, roomId, onClose }: { projectId: string; roomId: string; onClose: () => void }) {
  const router = useRouter();
  const readiness = useQuery(readinessQuery(projectId, roomId));
  const issue = useIssue(projectId);
  const [ticked, setTicked] = useState<Set<string>>(new Set());
  const r = readiness.data;
  if (readiness.isPending) return <p className="text-sm text-ink-soft">Looking at the room…</p>;
  if (!r) return <Notice tone="fault">{readiness.error?.message ?? "The room could not be read."}</Notice>;
  const open = r.items.filter((i) => !ticked.has(i.key));
  const error = issue.error instanceof ApiError ? issue.error : null;

  async function send() {
    if (!r) return;
    const made = await issue.mutateAsync({ roomId, letter: r.letter, confirm: [...ticked] }).catch(() => null);
    if (made) router.push(`/projects/${projectId}/submittals/${made.id}`);
    else void readiness.refetch();
  }

  return (
    <div className="mt-3 flex flex-col gap-3 rounded-sheet border border-ink/30 bg-white/70 p-4" data-testid="issue-panel">
      <p className="text-sm">
        Revision <strong>{r.letter}</strong> will freeze this room as it stands now: {r.panels} {r.panels === 1 ? "panel" : "panels"} on the boards and {r.scheduleRows}{" "}
        {r.scheduleRows === 1 ? "build-up" : "build-ups"} in the schedule{r.previous ? `, and supersede revision ${r.previous.letter}` : ""}. The architect and the client are told by e-mail.
      </p>
      {r.draft?.renderError && <Notice tone="fault" title={`The last attempt to issue revision ${r.letter} failed`}>{r.draft.renderError}</Notice>}
      {r.items.length > 0 && (
        <fieldset className="flex flex-col gap-1.5" data-testid="confirm-items">
          <legend className="mb-1 text-xs font-semibold uppercase tracking-wider text-caution-deep">Confirm before issuing ({r.items.length})</legend>
          {r.items.map((i) => (
            <label key={i.key} className="flex items-start gap-2 text-sm">
              <input
                type="checkbox"
                className="mt-1"
                checked={ticked.has(i.key)}
                onChange={(e) => setTicked((t) => (e.target.checked ? new Set(t).add(i.key) : new Set([...t].filter((k) => k !== i.key))))}
              />
              <span>
                <span className={`font-semibold ${i.severity === "error" ? "text-fault" : "text-caution-deep"}`}>{KIND_WORDS[i.kind]}:</span> {i.message}
              </span>
            </label>
          ))}
          <p className="text-xs text-ink-soft">What you tick is recorded with the revision. Anything you would rather fix, fix on the boards or the build-up first.</p>
        </fieldset>
      )}
      {issue.isPending ? (
        <Working what={`Issuing revision ${r.letter}: freezing the snapshot and rendering the submittal PDF`} expectSeconds={3} />
      ) : (
        <div className="flex flex-wrap items-center gap-3">
          <Button onClick={send} disabled={open.length > 0}>
            Issue revision {r.letter}
          </Button>
          <Button tone="quiet" onClick={onClose}>
            Cancel
          </Button>
          {open.length > 0 && <span className="text-xs text-ink-soft">{open.length} still to confirm</span>}
        </div>
      )}
      {error && (
        <Notice tone="fault" title={error.message}>
          {error.issues.length > 0 && (
            <ul className="list-disc pl-5">
              {error.issues.map((i) => (
                <li key={i.message}>{i.message}</li>
              ))}
            </ul>
          )}
        </Notice>
      )}
    </div>
  );
}
