import type { Metadata } from "next";
import { ResetPasswordForm } from "@/components/auth/reset-password-form";
import { SpentResetLink } from "@/components/auth/spent-reset-link";
import { resetLinkIsOpen, SPENT } from "@/lib/services/password";

export const metadata: Metadata = { title: "Set a new password" };
export const dynamic = "force-dynamic";

export default async function ResetPasswordPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const open = await resetLinkIsOpen(null, token);
  return (
    <>
      <h1 className="text-2xl font-semibold">Set a new password</h1>
      {open ? (
        <>
          <p className="mt-2 text-sm text-ink-soft">Choose a password you do not use anywhere else. Every device signed in to your account will be signed out.</p>
          <div className="mt-8">
            <ResetPasswordForm token={token} />
          </div>
        </>
      ) : (
        <div className="mt-8">
          <SpentResetLink message={SPENT} />
        </div>
      )}
    </>
  );
}
