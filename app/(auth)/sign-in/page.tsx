import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { SignInForm } from "@/components/auth/sign-in-form";
import { Notice } from "@/components/ui/notice";
import { currentActor } from "@/app/_lib/current-actor";

export const metadata: Metadata = { title: "Sign in" };
export const dynamic = "force-dynamic";

export default async function SignInPage({ searchParams }: { searchParams: Promise<{ next?: string; reset?: string }> }) {
  const { next, reset } = await searchParams;
  const safeNext = next && next.startsWith("/") && !next.startsWith("//") ? next : "/projects";
  if (await currentActor()) redirect(safeNext);
  return (
    <>
      <h1 className="text-2xl font-semibold">Sign in</h1>
      <p className="mt-2 text-sm text-ink-soft">Use the e-mail address your invitation was sent to.</p>
      <div className="mt-8 flex flex-col gap-5">
        {reset === "done" && <Notice tone="ok">Your new password is set. Sign in with it.</Notice>}
        <SignInForm next={safeNext} />
      </div>
    </>
  );
}
