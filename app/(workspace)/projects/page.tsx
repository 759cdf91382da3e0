import type { Metadata } from "next";
import { ProjectList } from "@/components/projects/project-list";
import { requirePageActor } from "@/app/_lib/current-actor";
import { listMyProjects } from "@/lib/services/projects";

export const metadata: Metadata = { title: "Projects" };

export default async function ProjectsPage() {
  const actor = await requirePageActor();
  return <ProjectList initial={listMyProjects(actor)} mayCreate={Boolean(actor.firmId)} />;
}
