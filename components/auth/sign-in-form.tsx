"use client";

import { useRouter } from "next/navigation";
import { useState, type FormEvent } from "react";
import { authClient } from "@/lib/auth/client";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";

export function SignInForm({ next, email: fixedEmail }: { next: string; email?: string }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const [fieldErrors, setFieldErrors] = useState<{ email?: string; password?: string }>({});
  const [busy, setBusy] = useState(false);

  async function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    const email = String(fixedEmail ?? form.get("email") ?? "").trim();
    const password = String(form.get("password") ?? "");
    const fe: typeof fieldErrors = {};
    if (!email) fe.email = "Enter your e-mail address.";
    if (!password) fe.password = "Enter your password.";
    setFieldErrors(fe);
    setError(null);
    if (fe.email || fe.password) return;
    setBusy(true);
    const { error: err } = await authClient.signIn.email({ email, password });
    setBusy(false);
    if (err) {
      setError(err.status === 401 ? "That e-mail and password do not match an account." : (err.message ?? "Sign-in failed. Try again."));
      return;
    }
    router.replace(next);
    router.refresh();
  }

  return (
    <form onSubmit={onSubmit} className="flex flex-col gap-5" noValidate>
      {error && <Notice tone="fault">{error}</Notice>}
      <TextField
        label="E-mail"
        name="email"
        type="email"
        autoComplete="email"
        defaultValue={fixedEmail}
        readOnly={Boolean(fixedEmail)}
        error={fieldErrors.email}
      />
      <TextField label="Password" name="password" type="password" autoComplete="current-password" error={fieldErrors.password} />
      <Button type="submit" disabled={busy}>
        {busy ? "Signing in…" : "Sign in"}
      </Button>
    </form>
  );
}
