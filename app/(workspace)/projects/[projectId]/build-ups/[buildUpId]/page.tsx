import type { Metadata } from "next";
import { Bench } from "@/components/bench/bench";
import { requirePageActor } from "@/app/_lib/current-actor";
import { orNotFound } from "@/app/_lib/or-not-found";
import { roleMay } from "@/lib/permissions";
import { getBuildUp } from "@/lib/services/build-ups";
import { authorize } from "@/lib/services/guard";

export const metadata: Metadata = { title: "Bench" };

export default async function BenchPage({ params }: { params: Promise<{ projectId: string; buildUpId: string }> }) {
  const { projectId, buildUpId } = await params;
  const actor = await requirePageActor();
  const buildUp = orNotFound(() => getBuildUp(actor, projectId, buildUpId));
  const role = authorize(actor, projectId, "project.view").membership.role;
  return <Bench initial={buildUp} units={actor.unitPreference} mayEdit={roleMay(role, "design.edit")} />;
}
