import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { FirmAccounts } from "@/components/firm/firm-accounts";
import { requirePageActor } from "@/app/_lib/current-actor";
import { getFirmAccounts } from "@/lib/services/firm";

export const metadata: Metadata = { title: "Firm accounts" };

export default async function FirmPage() {
  const actor = await requirePageActor();
  if (!actor.isFirmAdmin) redirect("/projects");
  return <FirmAccounts initial={getFirmAccounts(actor)} />;
}
