"use client";

import Link from "next/link";
import { useRouter } from "next/navigation";
import { useQuery } from "@tanstack/react-query";
import type { BuildUpView } from "@/lib/services/build-ups";
import { buildUpsQuery, useCreateBuildUp } from "@/lib/queries/build-ups";
import { ApiError } from "@/lib/queries/api";
import { formatLength, type UnitPreference } from "@/lib/units";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { TitleBlock } from "@/components/ui/sheet";
import { NEW_BUILD_UP_SPEC } from "@/components/bench/facing-defaults";
import { describeFacing } from "@/lib/build-ups/describe";

export function BuildUpLibrary({ projectId, initial, mayEdit, units }: { projectId: string; initial: BuildUpView[]; mayEdit: boolean; units: UnitPreference }) {
  const router = useRouter();
  const { data: buildUps = initial } = useQuery({ ...buildUpsQuery(projectId), initialData: initial });
  const create = useCreateBuildUp(projectId);

  async function createNew() {
    const made = await create
      .mutateAsync({ name: `Build-up ${buildUps.length + 1}`, spec: NEW_BUILD_UP_SPEC, moduleWidth: 0.6, moduleHeight: 1.2, borderX: 0.03, borderY: 0.03 })
      .catch(() => null);
    if (made) router.push(`/projects/${projectId}/build-ups/${made.id}`);
  }

  return (
    <>
      <TitleBlock
        kicker="Library"
        title="Build-ups"
        meta="Panel build-ups of this project: facing, cavity and infill. Open one on the bench to tune it."
        actions={mayEdit ? <Button onClick={createNew} disabled={create.isPending}>New build-up</Button> : undefined}
      />
      {create.error instanceof ApiError && <Notice tone="fault">{create.error.message}</Notice>}
      {buildUps.length === 0 ? (
        <p className="text-ink-soft">No build-ups yet.</p>
      ) : (
        <table className="w-full text-sm" data-testid="build-up-table">
          <thead>
            <tr className="border-b border-ink/40 text-left text-xs uppercase tracking-wider text-ink-soft">
              <th className="py-2 pr-3 font-semibold">Build-up</th>
              <th className="py-2 pr-3 font-semibold">Facing</th>
              <th className="py-2 pr-3 text-right font-semibold">Cavity</th>
              <th className="py-2 pr-3 text-right font-semibold">Open area</th>
              <th className="py-2 pr-3 text-right font-semibold">Peak</th>
              <th className="py-2 pr-3 text-right font-semibold">αw</th>
              <th className="py-2 pr-3 font-semibold">Class</th>
              <th className="py-2 text-right font-semibold">NRC</th>
            </tr>
          </thead>
          <tbody>
            {buildUps.map((b) => (
              <tr key={b.id} className="border-b border-ink/10 hover:bg-white/60">
                <td className="py-2.5 pr-3">
                  <Link href={`/projects/${projectId}/build-ups/${b.id}`} className="font-medium underline-offset-4 hover:text-copper-deep hover:underline">
                    {b.name}
                  </Link>
                </td>
                <td className="py-2.5 pr-3 text-ink-soft">{describeFacing(b.spec, units)}</td>
                <td className="figures py-2.5 pr-3 text-right">
                  {formatLength(b.spec.cavity.depth, units, { scale: "panel" })}
                  {b.spec.infill ? " + infill" : ""}
                </td>
                <td className="figures py-2.5 pr-3 text-right">{(b.result.openArea * 100).toFixed(1)} %</td>
                <td className="figures py-2.5 pr-3 text-right text-copper-deep">{Math.round(b.result.peakHz)} Hz</td>
                <td className="figures py-2.5 pr-3 text-right">
                  {b.result.ratings.alphaW.toFixed(2)}
                  {b.result.ratings.shape && ` (${b.result.ratings.shape})`}
                </td>
                <td className="py-2.5 pr-3">{b.result.ratings.class}</td>
                <td className="figures py-2.5 text-right">{b.result.ratings.nrc.toFixed(2)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </>
  );
}
