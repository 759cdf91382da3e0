"use client";

import Link from "next/link";
import { useState, type FormEvent } from "react";
import { useRequestPasswordReset } from "@/lib/queries/account";
import { ApiError } from "@/lib/queries/api";
import { requestPasswordResetSchema } from "@/lib/schemas/account";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";

export function ForgotPasswordForm({ email }: { email?: string }) {
  const request = useRequestPasswordReset();
  const [fieldError, setFieldError] = useState<string | undefined>();
  const [answer, setAnswer] = useState<string | null>(null);
  const err = request.error instanceof ApiError ? request.error : null;

  async function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const parsed = requestPasswordResetSchema.safeParse({ email: new FormData(e.currentTarget).get("email") ?? "" });
    if (!parsed.success) {
      setFieldError(parsed.error.issues[0]?.message);
      return;
    }
    setFieldError(undefined);
    const res = await request.mutateAsync(parsed.data).catch(() => null);
    if (res) setAnswer(res.message);
  }

  if (answer) {
    return (
      <div className="flex flex-col gap-5">
        <Notice tone="ok" title="Check your inbox">
          {answer}
        </Notice>
        <p className="text-sm text-ink-soft">
          Nothing after a few minutes? Check the address and your spam folder, then ask again. <Link className="underline underline-offset-2" href="/sign-in">Back to sign in</Link>
        </p>
      </div>
    );
  }

  return (
    <form onSubmit={onSubmit} className="flex flex-col gap-5" noValidate>
      {err && !err.fieldMessage("email") && <Notice tone="fault">{err.message}</Notice>}
      <TextField label="E-mail" name="email" type="email" autoComplete="email" defaultValue={email} error={fieldError ?? err?.fieldMessage("email")} />
      <Button type="submit" disabled={request.isPending}>
        {request.isPending ? "Sending…" : "Send me a link"}
      </Button>
      <p className="text-sm">
        <Link className="text-ink-soft underline underline-offset-2 hover:text-copper-deep" href="/sign-in">
          Back to sign in
        </Link>
      </p>
    </form>
  );
}
