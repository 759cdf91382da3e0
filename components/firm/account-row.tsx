"use client";

import { useState } from "react";
import type { FirmAccount } from "@/lib/services/firm";
import { useSetAccountDisabled } from "@/lib/queries/account";
import { ApiError } from "@/lib/queries/api";
import { Button } from "@/components/ui/button";

const day = (iso: string) => new Date(iso).toLocaleDateString("en-GB");

// One colleague's account: its standing, and disabling or re-enabling it after a confirmation
// that says what happens.
export function AccountRow({ account: a }: { account: FirmAccount }) {
  const setDisabled = useSetAccountDisabled();
  const [confirming, setConfirming] = useState(false);
  const err = setDisabled.error instanceof ApiError ? setDisabled.error : null;
  const disabled = Boolean(a.disabledAt);

  async function apply(next: boolean) {
    if (await setDisabled.mutateAsync({ userId: a.id, disabled: next }).catch(() => null)) setConfirming(false);
  }

  return (
    <>
      <tr className={`border-b border-ink/10 ${disabled ? "text-ink-faint" : ""}`} data-testid={`account-${a.email}`}>
        <td className="py-2.5 pr-3 font-medium">
          {a.name}
          {a.isFirmAdmin && <span className="ml-2 text-[11px] uppercase tracking-wider text-copper-deep">admin</span>}
          {a.isYou && <span className="ml-2 text-[11px] uppercase tracking-wider text-ink-faint">you</span>}
        </td>
        <td className="py-2.5 pr-3 text-ink-soft">{a.email}</td>
        <td className="figures py-2.5 pr-3 text-right">{a.projects}</td>
        <td className="figures py-2.5 pr-3 text-ink-soft">{day(a.since)}</td>
        <td className="py-2.5 pr-3">{disabled ? <span className="text-fault">Disabled {day(a.disabledAt!)}</span> : "Active"}</td>
        <td className="py-2.5 text-right">
          {!a.isYou &&
            (disabled ? (
              <Button tone="plain" className="text-xs" onClick={() => apply(false)} disabled={setDisabled.isPending}>
                Re-enable
              </Button>
            ) : (
              !confirming && (
                <Button tone="quiet" className="text-xs" onClick={() => setConfirming(true)}>
                  Disable…
                </Button>
              )
            ))}
        </td>
      </tr>
      {(confirming || err) && (
        <tr className="border-b border-ink/10 bg-paper-deep/40">
          <td colSpan={6} className="px-3 py-3 text-sm">
            {err ? (
              <p role="alert" className="text-fault">
                {err.message}
              </p>
            ) : (
              <div className="flex flex-wrap items-center gap-3">
                <div className="min-w-0 flex-1">
                  <p>
                    Disable {a.name}? They are signed out at once and cannot sign in until you re-enable the account. Their pins, replies and
                    decisions stay in the projects under their name.
                  </p>
                  {a.soleConsultantOn.length > 0 && (
                    <p className="mt-1 font-medium">
                      They are the only consultant on {a.soleConsultantOn.join(", ")}: nobody can change {a.soleConsultantOn.length === 1 ? "that project" : "those projects"}{" "}
                      until they are re-enabled or another consultant is invited.
                    </p>
                  )}
                </div>
                <Button tone="danger" className="text-xs" onClick={() => apply(true)} disabled={setDisabled.isPending}>
                  {setDisabled.isPending ? "Disabling…" : "Disable the account"}
                </Button>
                <Button tone="quiet" className="text-xs" onClick={() => setConfirming(false)}>
                  Cancel
                </Button>
              </div>
            )}
          </td>
        </tr>
      )}
    </>
  );
}
