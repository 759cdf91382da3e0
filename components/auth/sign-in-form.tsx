"use client";

import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState, type FormEvent } from "react";
import { authClient } from "@/lib/auth/client";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";

type SignInError = { status: number; code?: string; message?: string };

// What the person is told for each refusal. Locked and disabled accounts carry the
// server's own words (how long the pause lasts, who can re-enable the account).
export function signInErrorMessage(err: SignInError): string {
  if (err.status === 401) return "That e-mail and password do not match an account.";
  if (err.status === 429 && err.code === "ACCOUNT_LOCKED" && err.message) return err.message;
  if (err.status === 429) return "Too many sign-in attempts from your network. Wait a minute, then try again.";
  if (err.status === 403 && err.message) return err.message;
  return err.message ?? "Sign-in failed. Try again.";
}

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
      setError(signInErrorMessage(err));
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
      <p className="-mt-3 text-right text-xs">
        <Link href="/forgot-password" className="text-ink-soft underline underline-offset-2 hover:text-copper-deep">
          Forgot your password?
        </Link>
      </p>
      <Button type="submit" disabled={busy}>
        {busy ? "Signing in…" : "Sign in"}
      </Button>
    </form>
  );
}
