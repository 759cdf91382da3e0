"use client";

import { useQuery } from "@tanstack/react-query";
import { useRef, useState, type FormEvent } from "react";
import { firmQuery, useInviteToFirm, type FirmView } from "@/lib/queries/account";
import { ApiError } from "@/lib/queries/api";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { Sheet, TitleBlock } from "@/components/ui/sheet";
import { AccountRow } from "./account-row";

export function FirmAccounts({ initial }: { initial: FirmView }) {
  const { data = initial } = useQuery({ ...firmQuery(), initialData: initial });
  const invite = useInviteToFirm();
  const formRef = useRef<HTMLFormElement>(null);
  const [sent, setSent] = useState<string | null>(null);
  const err = invite.error instanceof ApiError ? invite.error : null;
  const disabledCount = data.accounts.filter((a) => a.disabledAt).length;

  async function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    setSent(null);
    const form = Object.fromEntries(new FormData(e.currentTarget)) as Record<string, string>;
    if (await invite.mutateAsync(form).catch(() => null)) {
      setSent(form.email ?? "");
      formRef.current?.reset();
    }
  }

  return (
    <>
      <TitleBlock kicker="Firm administration" title={data.firm.name} meta={`${data.accounts.length} accounts${disabledCount ? `, ${disabledCount} disabled` : ""}`} />
      <div className="grid gap-8 lg:grid-cols-[1.6fr_1fr]">
        <Sheet title="Accounts">
          <table className="w-full text-sm" data-testid="firm-accounts">
            <thead>
              <tr className="border-b border-ink/30 text-left text-xs uppercase tracking-wider text-ink-soft">
                <th className="py-2 pr-3 font-semibold">Name</th>
                <th className="py-2 pr-3 font-semibold">E-mail</th>
                <th className="py-2 pr-3 text-right font-semibold">Projects</th>
                <th className="py-2 pr-3 font-semibold">Since</th>
                <th className="py-2 pr-3 font-semibold">Status</th>
                <th className="py-2 font-semibold">
                  <span className="sr-only">Action</span>
                </th>
              </tr>
            </thead>
            <tbody>
              {data.accounts.map((a) => (
                <AccountRow key={a.id} account={a} />
              ))}
            </tbody>
          </table>
        </Sheet>
        <Sheet title="Invite a colleague">
          <form ref={formRef} onSubmit={onSubmit} className="flex flex-col gap-4" noValidate>
            {sent && <Notice tone="ok">Invitation sent to {sent}.</Notice>}
            {err && !err.issues.length && <Notice tone="fault">{err.message}</Notice>}
            <TextField label="E-mail" name="email" type="email" error={err?.fieldMessage("email")} />
            <TextField label="Note (optional)" name="message" error={err?.fieldMessage("message")} />
            <Button type="submit" disabled={invite.isPending}>
              {invite.isPending ? "Sending…" : "Send invitation"}
            </Button>
          </form>
          {data.pending.length > 0 && (
            <ul className="mt-5 border-t border-ink/15 pt-3 text-sm">
              {data.pending.map((p) => (
                <li key={p.id} className="flex justify-between py-1">
                  <span>{p.email}</span>
                  <span className="text-xs text-ink-faint">until {new Date(p.expiresAt).toLocaleDateString("en-GB")}</span>
                </li>
              ))}
            </ul>
          )}
        </Sheet>
      </div>
    </>
  );
}
