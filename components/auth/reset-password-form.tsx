"use client";

import { useRouter } from "next/navigation";
import { useState, type FormEvent } from "react";
import { useCompletePasswordReset } from "@/lib/queries/account";
import { ApiError } from "@/lib/queries/api";
import { completePasswordResetSchema } from "@/lib/schemas/account";
import { MIN_PASSWORD_LENGTH } from "@/lib/auth/password-rules";
import { fieldErrorsOf } from "@/components/ui/field-errors";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { SpentResetLink } from "./spent-reset-link";

export function ResetPasswordForm({ token }: { token: string }) {
  const router = useRouter();
  const complete = useCompletePasswordReset(token);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const err = complete.error instanceof ApiError ? complete.error : null;

  async function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const parsed = completePasswordResetSchema.safeParse(Object.fromEntries(new FormData(e.currentTarget)));
    if (!parsed.success) {
      setErrors(fieldErrorsOf(parsed.error));
      return;
    }
    setErrors({});
    if (await complete.mutateAsync(parsed.data).catch(() => null)) router.replace("/sign-in?reset=done");
  }

  // Used up while the page was open (another tab, or an hour passed).
  if (err?.status === 410) return <SpentResetLink message={err.message} />;

  return (
    <form onSubmit={onSubmit} className="flex flex-col gap-5" noValidate>
      {err && !err.issues.length && <Notice tone="fault">{err.message}</Notice>}
      <TextField
        label="New password"
        name="password"
        type="password"
        autoComplete="new-password"
        hint={`At least ${MIN_PASSWORD_LENGTH} characters.`}
        error={errors.password ?? err?.fieldMessage("password")}
      />
      <TextField label="New password again" name="confirm" type="password" autoComplete="new-password" error={errors.confirm ?? err?.fieldMessage("confirm")} />
      <Button type="submit" disabled={complete.isPending}>
        {complete.isPending ? "Saving…" : "Set the new password"}
      </Button>
    </form>
  );
}
