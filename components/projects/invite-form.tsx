"use client";

import { useRef, useState, type FormEvent } from "react";
import { useInvite } from "@/lib/queries/projects";
import { ApiError } from "@/lib/queries/api";
import { PROJECT_ROLES } from "@/lib/roles";
import { ROLE_WORDS } from "@/lib/permissions";
import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";

export function InviteForm({ projectId }: { projectId: string }) {
  const invite = useInvite(projectId);
  const formRef = useRef<HTMLFormElement>(null);
  const [sentTo, setSentTo] = useState<{ email: string; mailed: boolean } | null>(null);
  const err = invite.error instanceof ApiError ? invite.error : null;

  async function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    setSentTo(null);
    const form = Object.fromEntries(new FormData(e.currentTarget)) as Record<string, string>;
    const result = await invite.mutateAsync(form as never).catch(() => null);
    if (result) {
      setSentTo({ email: result.invitation.email, mailed: result.delivery.status === "sent" });
      formRef.current?.reset();
    }
  }

  return (
    <form ref={formRef} onSubmit={onSubmit} className="flex flex-col gap-4" noValidate>
      {sentTo && (
        <Notice tone={sentTo.mailed ? "ok" : "caution"}>
          {sentTo.mailed
            ? `Invitation sent to ${sentTo.email}.`
            : `The invitation to ${sentTo.email} is saved, but the e-mail could not be delivered. Withdraw it and try again later.`}
        </Notice>
      )}
      {err && !err.issues.length && <Notice tone="fault">{err.message}</Notice>}
      <TextField label="E-mail" name="email" type="email" placeholder="name@firm.example" error={err?.fieldMessage("email")} />
      <SelectField
        label="Role"
        name="role"
        defaultValue="architect"
        error={err?.fieldMessage("role")}
        options={PROJECT_ROLES.map((r) => ({ value: r, label: ROLE_WORDS[r] }))}
      />
      <TextField label="Note (optional)" name="message" error={err?.fieldMessage("message")} />
      <Button type="submit" disabled={invite.isPending}>
        {invite.isPending ? "Sending…" : "Send invitation"}
      </Button>
    </form>
  );
}
