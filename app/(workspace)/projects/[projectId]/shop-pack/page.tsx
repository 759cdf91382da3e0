import type { Metadata } from "next";
import { ShopPackList } from "@/components/shop-pack/shop-pack-list";
import { requirePageActor } from "@/app/_lib/current-actor";
import { orNotFound } from "@/app/_lib/or-not-found";
import { listShopPacks } from "@/lib/services/submittals";

export const metadata: Metadata = { title: "Shop pack" };

export default async function ShopPackPage({ params }: { params: Promise<{ projectId: string }> }) {
  const { projectId } = await params;
  const actor = await requirePageActor();
  const { entries, units } = orNotFound(() => listShopPacks(actor, projectId));
  return <ShopPackList projectId={projectId} entries={entries} units={units} />;
}
