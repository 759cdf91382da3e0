import type { ReactNode } from "react";
import { notFound } from "next/navigation";
import { ProjectNav } from "@/components/projects/project-nav";
import { requirePageActor } from "@/app/_lib/current-actor";
import { AppError } from "@/lib/errors";
import { roleMay } from "@/lib/permissions";
import { authorize } from "@/lib/services/guard";

export default async function ProjectLayout({ children, params }: { children: ReactNode; params: Promise<{ projectId: string }> }) {
  const { projectId } = await params;
  const actor = await requirePageActor();
  let access;
  try {
    access = authorize(actor, projectId, "project.view");
  } catch (e) {
    if (e instanceof AppError && e.code === "not_found") notFound();
    throw e;
  }
  const role = access.membership.role;
  return (
    <>
      <ProjectNav
        projectId={projectId}
        projectName={access.project.name}
        show={{ design: roleMay(role, "design.view"), submittals: roleMay(role, "submittal.viewIssued"), shopPack: roleMay(role, "shop.download") }}
      />
      {children}
    </>
  );
}
