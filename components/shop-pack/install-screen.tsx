"use client";

import Link from "next/link";
import { useQuery } from "@tanstack/react-query";
import { useState } from "react";
import type { SubmittalView } from "@/lib/services/submittals";
import { submittalQuery, useInstallActions } from "@/lib/queries/submittals";
import type { UnitPreference } from "@/lib/units";
import { Sheet, TitleBlock } from "@/components/ui/sheet";
import { StateBadge } from "@/components/submittals/state-badge";
import { ElevationBoard } from "./elevation-board";
import { PackDownload } from "./pack-download";
import { PanelList } from "./panel-list";

type Panel = NonNullable<SubmittalView["install"]>["placements"][number];

// One approved revision on site: its shop pack with the hash to check, each treated surface
// drawn with the panels installed so far, and the list to mark them and add site photos.
export function InstallScreen({ initial, units }: { initial: SubmittalView; units: UnitPreference }) {
  const { data: view = initial } = useQuery({ ...submittalQuery(initial.projectId, initial.id), initialData: initial });
  const { mark, photo } = useInstallActions(view.projectId, view.id);
  const [busy, setBusy] = useState<string | null>(null);
  const [error, setError] = useState<{ placementId: string; error: unknown } | null>(null);
  const [openOnly, setOpenOnly] = useState(false);
  const install = view.install;
  const panels = install?.placements ?? [];
  const installed = panels.filter((p) => p.installedAt).length;

  async function run(p: Panel, task: () => Promise<unknown>) {
    setBusy(p.id);
    setError(null);
    await task().catch((e: unknown) => setError({ placementId: p.id, error: e }));
    setBusy(null);
  }
  const actions = view.may.install
    ? {
        onMark: (p: Panel) => run(p, () => mark.mutateAsync({ placementId: p.id, installed: !p.installedAt })),
        onPhoto: (p: Panel, file: File) => run(p, () => photo.mutateAsync({ placementId: p.id, file })),
        busy,
        error,
      }
    : null;

  return (
    <>
      <TitleBlock
        kicker="Shop pack"
        title={`${view.roomName}: revision ${view.letter}`}
        meta={
          <span className="flex flex-wrap items-center gap-3">
            <StateBadge state={view.state} />
            <span className="figures" data-testid="install-count">{`${installed} of ${panels.length} panels installed`}</span>
            <Link href={`/projects/${view.projectId}/submittals/${view.id}`} className="text-copper-deep underline-offset-4 hover:underline">
              The submittal and its decision
            </Link>
          </span>
        }
      />
      <div className="grid gap-8 xl:grid-cols-[1fr_1.6fr]">
        <div className="flex flex-col gap-6">
          <Sheet title="Download">
            {view.decision?.outcome === "approved-as-noted" && (
              <p className="mb-3 border-l-2 border-caution pl-3 text-sm">
                <span className="font-semibold">Build to the client&apos;s notes:</span> {view.decision.notes}
              </p>
            )}
            <PackDownload packs={view.shopPacks} units={units} />
          </Sheet>
          <p className="text-xs text-ink-soft">
            Overhead and high-level panels need rated fixings and, where required, seismic restraint designed by a competent person; follow the shop drawing&apos;s fixing detail and local codes.
          </p>
        </div>
        <div className="flex flex-col gap-6">
          <div className="flex flex-wrap items-center gap-2 text-xs" role="group" aria-label="Which panels to list">
            <span className="text-ink-soft">List:</span>
            {[false, true].map((only) => (
              <button
                key={String(only)}
                type="button"
                aria-pressed={openOnly === only}
                onClick={() => setOpenOnly(only)}
                className={`rounded-sheet border px-2 py-1 ${openOnly === only ? "border-ink bg-ink text-paper" : "border-ink/30 bg-white/60"}`}
              >
                {only ? `Not installed yet (${panels.length - installed})` : `All panels (${panels.length})`}
              </button>
            ))}
            <span className="text-ink-soft">x and y: the panel&apos;s lower-left corner from the surface&apos;s lower-left corner (the datum).</span>
          </div>
          {install?.surfaces.map((s) => {
            const mine = panels.filter((p) => p.surfaceKey === s.key);
            const listed = openOnly ? mine.filter((p) => !p.installedAt) : mine;
            return (
              <Sheet key={s.key} title={s.name}>
                <ElevationBoard surface={s} panels={mine} onToggle={actions ? actions.onMark : null} />
                <div className="mt-4">
                  {listed.length ? <PanelList surfaceName={s.name} panels={listed} units={units} actions={actions} /> : <p className="text-sm text-ink-soft">Every panel here is installed.</p>}
                </div>
              </Sheet>
            );
          })}
          {install && install.surfaces.length === 0 && <p className="text-sm text-ink-soft">This revision places no panels on a board; its treatment is counted by area only.</p>}
        </div>
      </div>
    </>
  );
}
