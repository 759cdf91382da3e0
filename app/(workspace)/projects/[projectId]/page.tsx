import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { ProjectOverviewView } from "@/components/projects/project-overview";
import { requirePageActor } from "@/app/_lib/current-actor";
import { AppError } from "@/lib/errors";
import { getProjectOverview } from "@/lib/services/projects";

export const metadata: Metadata = { title: "Project" };

export default async function ProjectPage({ params }: { params: Promise<{ projectId: string }> }) {
  const { projectId } = await params;
  const actor = await requirePageActor();
  try {
    const overview = getProjectOverview(actor, projectId);
    return <ProjectOverviewView initial={overview} units={actor.unitPreference} myUserId={actor.userId} />;
  } catch (e) {
    if (e instanceof AppError && e.code === "not_found") notFound();
    throw e;
  }
}
