import type { Metadata } from "next";
import { SettingsForm } from "@/components/settings/settings-form";
import { PasswordForm } from "@/components/settings/password-form";
import { SessionList } from "@/components/settings/session-list";
import { requirePageActor } from "@/app/_lib/current-actor";
import { getMe } from "@/lib/services/settings";
import { listMySessions } from "@/lib/services/sessions";

export const metadata: Metadata = { title: "Settings" };

export default async function SettingsPage() {
  const actor = await requirePageActor();
  return (
    <>
      <SettingsForm initial={getMe(actor)} />
      <div className="mt-10 grid max-w-5xl gap-8 lg:grid-cols-2">
        <PasswordForm />
        <SessionList initial={listMySessions(actor)} />
      </div>
    </>
  );
}
