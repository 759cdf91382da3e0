"use client";

import { useRouter } from "next/navigation";
import { useQuery, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import type { SessionView } from "@/lib/services/sessions";
import { sessionsQuery, useEndAllSessions, useEndSession } from "@/lib/queries/account";
import { ApiError } from "@/lib/queries/api";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { Sheet } from "@/components/ui/sheet";

const when = (iso: string) => new Date(iso).toLocaleString("en-GB", { dateStyle: "medium", timeStyle: "short" });

// The devices signed in to this account: sign one out, or all of them (this one included).
export function SessionList({ initial }: { initial: SessionView[] }) {
  const router = useRouter();
  const qc = useQueryClient();
  const { data: sessions = initial } = useQuery({ ...sessionsQuery(), initialData: initial });
  const endOne = useEndSession();
  const endAll = useEndAllSessions();
  const [confirming, setConfirming] = useState(false);
  const failure = [endOne.error, endAll.error].find((e) => e instanceof ApiError) as ApiError | undefined;

  async function signOutEverywhere() {
    if (await endAll.mutateAsync().catch(() => null)) {
      qc.clear();
      router.replace("/sign-in");
      router.refresh();
    }
  }

  return (
    <Sheet title="Signed-in devices" aside={<span className="figures text-xs text-ink-faint">{sessions.length}</span>}>
      {failure && <Notice tone="fault">{failure.message}</Notice>}
      <ul className="flex flex-col divide-y divide-ink/10" data-testid="session-list">
        {sessions.map((s) => (
          <li key={s.id} className="flex items-center justify-between gap-3 py-2.5 text-sm">
            <span className="min-w-0">
              <span className="block font-medium">
                {s.device}
                {s.current && <span className="ml-2 text-[11px] uppercase tracking-wider text-copper-deep">this device</span>}
              </span>
              <span className="block text-xs text-ink-faint">
                Signed in {when(s.signedInAt)} · ends {when(s.expiresAt)}
                {s.address ? ` · from ${s.address}` : ""}
              </span>
            </span>
            {!s.current && (
              <Button tone="quiet" className="shrink-0 text-xs" onClick={() => endOne.mutate(s.id)} disabled={endOne.isPending}>
                Sign out
              </Button>
            )}
          </li>
        ))}
      </ul>
      <div className="mt-4 border-t border-ink/15 pt-4">
        {confirming ? (
          <div className="flex flex-wrap items-center gap-3">
            <p className="text-sm">Sign out on every device, this one included?</p>
            <Button tone="danger" onClick={signOutEverywhere} disabled={endAll.isPending}>
              {endAll.isPending ? "Signing out…" : "Yes, sign out everywhere"}
            </Button>
            <Button tone="quiet" onClick={() => setConfirming(false)}>
              Keep me signed in
            </Button>
          </div>
        ) : (
          <Button tone="plain" onClick={() => setConfirming(true)}>
            Sign out everywhere
          </Button>
        )}
      </div>
    </Sheet>
  );
}
