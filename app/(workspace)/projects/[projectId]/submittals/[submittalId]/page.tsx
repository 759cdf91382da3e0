import type { Metadata } from "next";
import { RevisionScreen } from "@/components/submittals/revision-screen";
import { ClosedRevision } from "@/components/submittals/closed-revision";
import { requirePageActor } from "@/app/_lib/current-actor";
import { orRefusal } from "@/app/_lib/or-refusal";
import { getSubmittal } from "@/lib/services/submittals";

export const metadata: Metadata = { title: "Submittal" };

export default async function SubmittalPage({ params }: { params: Promise<{ projectId: string; submittalId: string }> }) {
  const { projectId, submittalId } = await params;
  const actor = await requirePageActor();
  const found = orRefusal(() => getSubmittal(actor, projectId, submittalId));
  return found.ok ? <RevisionScreen initial={found.value} units={actor.unitPreference} /> : <ClosedRevision projectId={projectId} message={found.message} />;
}
