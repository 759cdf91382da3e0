"use client";

import Link from "next/link";
import { useQuery } from "@tanstack/react-query";
import type { ProjectOverview } from "@/lib/services/projects";
import { projectQuery } from "@/lib/queries/projects";
import { ACTION_WORDS, ROLE_WORDS } from "@/lib/permissions";
import { formatLength, formatVolume, type UnitPreference } from "@/lib/units";
import { ROOM_USE_WORDS, type RoomUse } from "@/lib/room-uses";
import { RoleBadge } from "@/components/ui/role-badge";
import { Sheet, TitleBlock } from "@/components/ui/sheet";
import { Notice } from "@/components/ui/notice";
import { InviteForm } from "./invite-form";
import { OpenInvitations } from "./open-invitations";
import { ClearanceForm } from "./clearance-form";
import { TeamList } from "./team-list";
import { ProjectFire } from "./project-fire";

export function ProjectOverviewView({ initial, units, myUserId }: { initial: ProjectOverview; units: UnitPreference; myUserId: string }) {
  const { data = initial } = useQuery({ ...projectQuery(initial.project.id), initialData: initial });
  const { project, myRole, team, rooms, invitations, mayDo } = data;
  return (
    <>
      <TitleBlock
        kicker={project.reference ? `Project ${project.reference}` : "Project"}
        title={project.name}
        meta={
          <span className="flex flex-wrap items-center gap-3">
            {project.site && <span>{project.site}</span>}
            <span className="flex items-center gap-2">
              You are <RoleBadge role={myRole} />
            </span>
          </span>
        }
      />
      <div className="grid gap-8 lg:grid-cols-[1.5fr_1fr]">
        <div className="flex flex-col gap-8">
          {rooms ? (
            <Sheet
              title="Rooms"
              aside={
                <span className="figures text-xs text-ink-faint" data-testid="project-open-pins">
                  {rooms.length} · {data.openPins ?? 0} open {data.openPins === 1 ? "pin" : "pins"}
                </span>
              }
            >
              {rooms.length === 0 ? (
                <p className="text-sm text-ink-soft">No rooms yet.</p>
              ) : (
                <table className="w-full text-sm" data-testid="room-table">
                  <thead>
                    <tr className="border-b border-ink/30 text-left text-xs uppercase tracking-wider text-ink-soft">
                      <th className="py-2 pr-3 font-semibold">Room</th>
                      <th className="py-2 pr-3 font-semibold">Use</th>
                      <th className="py-2 pr-3 text-right font-semibold">L × W × H</th>
                      <th className="py-2 text-right font-semibold">Volume</th>
                    </tr>
                  </thead>
                  <tbody>
                    {rooms.map((r) => (
                      <tr key={r.id} className="border-b border-ink/10">
                        <td className="py-2.5 pr-3 font-medium">
                          <Link href={`/projects/${project.id}/rooms/${r.id}`} className="underline-offset-4 hover:text-copper-deep hover:underline">
                            {r.name}
                          </Link>
                        </td>
                        <td className="py-2.5 pr-3 text-ink-soft">{ROOM_USE_WORDS[r.use as RoomUse] ?? r.use}</td>
                        <td className="figures py-2.5 pr-3 text-right">
                          {r.length && r.width && r.height
                            ? [r.length, r.width, r.height].map((v) => formatLength(v, units)).join(" × ")
                            : "—"}
                        </td>
                        <td className="figures py-2.5 text-right">{r.volume ? formatVolume(r.volume, units) : "—"}</td>
                      </tr>
                    ))}
                  </tbody>
                </table>
              )}
            </Sheet>
          ) : (
            <Notice title="Design drafts are not shown to your role">
              As {ROLE_WORDS[myRole].toLowerCase()} you see this project&apos;s {myRole === "installer" ? "approved" : "issued"} submittals; rooms, build-ups and layouts stay
              with the design team until they are issued.{" "}
              <Link href={`/projects/${project.id}/${myRole === "installer" ? "shop-pack" : "submittals"}`} className="font-semibold underline">
                {myRole === "installer" ? "Open the shop packs" : "Open the submittals"}
              </Link>
            </Notice>
          )}
          {mayDo.includes("project.edit") && (
            <Sheet title="Board rules">
              <p className="mb-3 text-xs text-ink-soft">Panels closer than this to a surface edge or an opening are flagged on every board of the project.</p>
              <ClearanceForm projectId={project.id} clearance={project.edgeClearance} units={units} />
            </Sheet>
          )}
          <ProjectFire projectId={project.id} required={project.fireRequired} mayEdit={mayDo.includes("project.edit")} />
          <Sheet title="What you may do here">
            <ul className="grid gap-1.5 text-sm sm:grid-cols-2" data-testid="may-do">
              {mayDo.map((a) => (
                <li key={a} className="flex items-start gap-2">
                  <span aria-hidden className="mt-1.5 h-1.5 w-1.5 shrink-0 rounded-full bg-copper" />
                  {ACTION_WORDS[a].charAt(0).toUpperCase() + ACTION_WORDS[a].slice(1)}
                </li>
              ))}
            </ul>
          </Sheet>
        </div>
        <div className="flex flex-col gap-8">
          <TeamList projectId={project.id} team={team} mayRemove={mayDo.includes("team.remove")} myUserId={myUserId} />
          {invitations && (
            <Sheet title="Invite someone">
              <InviteForm projectId={project.id} />
              <OpenInvitations projectId={project.id} invitations={invitations} />
            </Sheet>
          )}
        </div>
      </div>
    </>
  );
}
