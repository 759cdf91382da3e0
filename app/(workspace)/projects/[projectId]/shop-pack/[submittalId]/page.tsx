import type { Metadata } from "next";
import { InstallScreen } from "@/components/shop-pack/install-screen";
import { ClosedRevision } from "@/components/submittals/closed-revision";
import { requirePageActor } from "@/app/_lib/current-actor";
import { orRefusal } from "@/app/_lib/or-refusal";
import { getShopPack } from "@/lib/services/submittals";

export const metadata: Metadata = { title: "Shop pack" };

export default async function InstallPage({ params }: { params: Promise<{ projectId: string; submittalId: string }> }) {
  const { projectId, submittalId } = await params;
  const actor = await requirePageActor();
  const found = orRefusal(() => getShopPack(actor, projectId, submittalId));
  return found.ok ? <InstallScreen initial={found.value} units={actor.unitPreference} /> : <ClosedRevision projectId={projectId} message={found.message} />;
}
