"use client";

import Link from "next/link";
import { useRef, useState, type FormEvent } from "react";
import { useChangePassword } from "@/lib/queries/account";
import { ApiError } from "@/lib/queries/api";
import { changePasswordSchema } from "@/lib/schemas/account";
import { MIN_PASSWORD_LENGTH } from "@/lib/auth/password-rules";
import { fieldErrorsOf } from "@/components/ui/field-errors";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { Sheet } from "@/components/ui/sheet";

export function PasswordForm() {
  const change = useChangePassword();
  const formRef = useRef<HTMLFormElement>(null);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [done, setDone] = useState<string | null>(null);
  const err = change.error instanceof ApiError ? change.error : null;
  const fieldError = (f: string) => errors[f] ?? err?.fieldMessage(f);

  async function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    setDone(null);
    const parsed = changePasswordSchema.safeParse(Object.fromEntries(new FormData(e.currentTarget)));
    if (!parsed.success) {
      setErrors(fieldErrorsOf(parsed.error));
      return;
    }
    setErrors({});
    const res = await change.mutateAsync(parsed.data).catch(() => null);
    if (!res) return;
    formRef.current?.reset();
    const n = res.otherSessionsEnded;
    setDone(n ? `Password changed. ${n} other device${n === 1 ? " was" : "s were"} signed out.` : "Password changed.");
  }

  return (
    <Sheet title="Password">
      <form ref={formRef} onSubmit={onSubmit} className="flex flex-col gap-4" noValidate>
        {done && <Notice tone="ok">{done}</Notice>}
        {err && !err.issues.length && <Notice tone="fault">{err.message}</Notice>}
        <TextField label="Current password" name="currentPassword" type="password" autoComplete="current-password" error={fieldError("currentPassword")} />
        <TextField
          label="New password"
          name="password"
          type="password"
          autoComplete="new-password"
          hint={`At least ${MIN_PASSWORD_LENGTH} characters. Your other devices will be signed out.`}
          error={fieldError("password")}
        />
        <TextField label="New password again" name="confirm" type="password" autoComplete="new-password" error={fieldError("confirm")} />
        <div className="flex flex-wrap items-center gap-4">
          <Button type="submit" disabled={change.isPending}>
            {change.isPending ? "Changing…" : "Change password"}
          </Button>
          <Link href="/forgot-password" className="text-xs text-ink-soft underline underline-offset-2 hover:text-copper-deep">
            Forgot the current one?
          </Link>
        </div>
      </form>
    </Sheet>
  );
}
