import type { Metadata } from "next";
import { BuildUpLibrary } from "@/components/build-ups/build-up-library";
import { requirePageActor } from "@/app/_lib/current-actor";
import { orNotFound } from "@/app/_lib/or-not-found";
import { roleMay } from "@/lib/permissions";
import { listBuildUps } from "@/lib/services/build-ups";
import { authorize } from "@/lib/services/guard";

export const metadata: Metadata = { title: "Build-ups" };

export default async function BuildUpsPage({ params }: { params: Promise<{ projectId: string }> }) {
  const { projectId } = await params;
  const actor = await requirePageActor();
  const buildUps = orNotFound(() => listBuildUps(actor, projectId));
  const role = authorize(actor, projectId, "project.view").membership.role;
  return <BuildUpLibrary projectId={projectId} initial={buildUps} mayEdit={roleMay(role, "design.edit")} units={actor.unitPreference} />;
}
