"use client";

import Link from "next/link";
import { useQuery } from "@tanstack/react-query";
import { useState } from "react";
import type { ProjectListItem } from "@/lib/services/projects";
import { projectsQuery } from "@/lib/queries/projects";
import { RoleBadge } from "@/components/ui/role-badge";
import { TitleBlock } from "@/components/ui/sheet";
import { Button } from "@/components/ui/button";
import { CreateProjectForm } from "./create-project-form";

export function ProjectList({ initial, mayCreate }: { initial: ProjectListItem[]; mayCreate: boolean }) {
  const { data: projects = initial } = useQuery({ ...projectsQuery(), initialData: initial });
  const [creating, setCreating] = useState(false);
  return (
    <>
      <TitleBlock
        kicker="Workspace"
        title="Projects"
        meta={`${projects.length} ${projects.length === 1 ? "project" : "projects"} you are a member of`}
        actions={mayCreate && !creating ? <Button onClick={() => setCreating(true)}>New project</Button> : undefined}
      />
      {creating && <CreateProjectForm onDone={() => setCreating(false)} />}
      {projects.length === 0 ? (
        <p className="text-ink-soft">
          You are not on any project yet. {mayCreate ? "Start one with New project." : "When a consultant invites you, the project appears here."}
        </p>
      ) : (
        <table className="w-full border-collapse text-sm" data-testid="project-table">
          <thead>
            <tr className="border-b border-ink/40 text-left text-xs uppercase tracking-wider text-ink-soft">
              <th className="py-2 pr-4 font-semibold">Ref.</th>
              <th className="py-2 pr-4 font-semibold">Project</th>
              <th className="py-2 pr-4 font-semibold">Site</th>
              <th className="py-2 pr-4 font-semibold">My role</th>
              <th className="py-2 text-right font-semibold">Team</th>
            </tr>
          </thead>
          <tbody>
            {projects.map((p) => (
              <tr key={p.id} className="border-b border-ink/10 hover:bg-white/60">
                <td className="figures py-3 pr-4 text-ink-soft">{p.reference ?? "—"}</td>
                <td className="py-3 pr-4">
                  <Link href={`/projects/${p.id}`} className="font-medium text-ink underline-offset-4 hover:text-copper-deep hover:underline">
                    {p.name}
                  </Link>
                </td>
                <td className="py-3 pr-4 text-ink-soft">{p.site ?? "—"}</td>
                <td className="py-3 pr-4">
                  <RoleBadge role={p.role} />
                </td>
                <td className="figures py-3 text-right">{p.members}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </>
  );
}
