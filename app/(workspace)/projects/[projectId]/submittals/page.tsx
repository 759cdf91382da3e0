import type { Metadata } from "next";
import { SubmittalListView } from "@/components/submittals/submittal-list";
import { requirePageActor } from "@/app/_lib/current-actor";
import { orNotFound } from "@/app/_lib/or-not-found";
import { listSubmittals } from "@/lib/services/submittals";

export const metadata: Metadata = { title: "Submittals" };

export default async function SubmittalsPage({ params }: { params: Promise<{ projectId: string }> }) {
  const { projectId } = await params;
  const actor = await requirePageActor();
  return <SubmittalListView projectId={projectId} initial={orNotFound(() => listSubmittals(actor, projectId))} />;
}
