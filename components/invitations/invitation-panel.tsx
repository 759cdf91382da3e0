"use client";

import { useRouter } from "next/navigation";
import { useState, type FormEvent } from "react";
import { authClient } from "@/lib/auth/client";
import { useAcceptInvitation, useCreateInvitedAccount } from "@/lib/queries/account";
import { ApiError } from "@/lib/queries/api";
import { inviteSignUpSchema } from "@/lib/schemas/invitation";
import type { InvitationView } from "@/lib/services/invitations";
import { ROLE_WORDS } from "@/lib/permissions";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { RoleBadge } from "@/components/ui/role-badge";
import { SignInForm } from "@/components/auth/sign-in-form";
import { fieldErrorsOf } from "@/components/ui/field-errors";

type Props = { token: string; view: InvitationView; signedInAs: string | null };

export function InvitationPanel({ token, view, signedInAs }: Props) {
  const router = useRouter();
  const accept = useAcceptInvitation(token);
  const create = useCreateInvitedAccount(token);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [failure, setFailure] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const here = `/invite/${token}`;

  async function acceptNow() {
    setFailure(null);
    try {
      const { projectId } = await accept.mutateAsync();
      router.replace(projectId ? `/projects/${projectId}` : "/projects");
      router.refresh();
    } catch (e) {
      setFailure(e instanceof ApiError ? e.message : "The invitation could not be accepted. Try again.");
    }
  }

  // The account is made for the invited address from the link's token and joins at once;
  // then the new holder signs in with the password just chosen.
  async function signUp(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = Object.fromEntries(new FormData(e.currentTarget));
    const parsed = inviteSignUpSchema.safeParse(form);
    if (!parsed.success) {
      setErrors(fieldErrorsOf(parsed.error));
      return;
    }
    setErrors({});
    setFailure(null);
    setBusy(true);
    try {
      const created = await create.mutateAsync(parsed.data);
      const { error } = await authClient.signIn.email({ email: created.email, password: parsed.data.password });
      if (error) {
        setFailure(`Your account is ready, but signing in failed: ${error.message ?? "try again from the sign-in page."}`);
        return;
      }
      router.replace(created.projectId ? `/projects/${created.projectId}` : "/projects");
      router.refresh();
    } catch (err) {
      if (err instanceof ApiError && err.issues.length) setErrors(Object.fromEntries(err.issues.map((i) => [i.field, i.message])));
      else setFailure(err instanceof ApiError ? err.message : "The account could not be created. Try again.");
    } finally {
      setBusy(false);
    }
  }

  const heading = view.projectName ? (
    <>
      Join <span className="text-copper-deep">{view.projectName}</span>
    </>
  ) : (
    <>
      Join <span className="text-copper-deep">{view.firmName}</span>
    </>
  );

  return (
    <div className="flex flex-col gap-6">
      <div>
        <p className="text-xs font-semibold uppercase tracking-[0.18em] text-ink-faint">Invitation</p>
        <h1 className="mt-1 text-2xl font-semibold">{heading}</h1>
        <p className="mt-2 text-sm text-ink-soft">
          {view.inviterName ?? "A member of the team"} invited <strong>{view.email}</strong>
          {view.role ? (
            <>
              {" "}
              as <RoleBadge role={view.role} />
            </>
          ) : (
            <> to open an account with {view.firmName}</>
          )}
          .
        </p>
      </div>
      {failure && <Notice tone="fault">{failure}</Notice>}

      {signedInAs === view.email && (
        <Button onClick={acceptNow} disabled={accept.isPending}>
          {accept.isPending ? "Joining…" : view.role ? `Join as ${ROLE_WORDS[view.role].toLowerCase()}` : "Join the firm"}
        </Button>
      )}

      {signedInAs && signedInAs !== view.email && (
        <Notice tone="caution" title="You are signed in with another address">
          You are signed in as {signedInAs}; this invitation is for {view.email}. Sign out, then open the link again.
        </Notice>
      )}

      {!signedInAs && view.accountExists && (
        <>
          <p className="text-sm text-ink-soft">You already have a Cavitas account. Sign in to accept.</p>
          <SignInForm next={here} email={view.email} />
        </>
      )}

      {!signedInAs && !view.accountExists && (
        <form onSubmit={signUp} className="flex flex-col gap-5" noValidate>
          <p className="text-sm text-ink-soft">Create your account to accept. Your e-mail address is the one invited.</p>
          <TextField label="E-mail" name="email" value={view.email} readOnly />
          <TextField label="Your name" name="name" autoComplete="name" error={errors.name} />
          <TextField label="Password" name="password" type="password" autoComplete="new-password" hint="At least 10 characters." error={errors.password} />
          <TextField label="Password again" name="confirm" type="password" autoComplete="new-password" error={errors.confirm} />
          <Button type="submit" disabled={busy}>
            {busy ? "Creating your account…" : "Create account and join"}
          </Button>
        </form>
      )}
    </div>
  );
}
