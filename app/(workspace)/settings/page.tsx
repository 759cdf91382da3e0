import type { Metadata } from "next";
import { SettingsForm } from "@/components/settings/settings-form";
import { requirePageActor } from "@/app/_lib/current-actor";
import { getMe } from "@/lib/services/settings";

export const metadata: Metadata = { title: "Settings" };

export default async function SettingsPage() {
  const actor = await requirePageActor();
  return <SettingsForm initial={getMe(actor)} />;
}
