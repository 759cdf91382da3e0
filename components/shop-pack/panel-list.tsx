"use client";

import type { SubmittalView } from "@/lib/services/submittals";
import { formatLength, type UnitPreference } from "@/lib/units";
import { ApiError } from "@/lib/queries/api";
import { formatDay } from "@/lib/documents/format";

type Panel = NonNullable<SubmittalView["install"]>["placements"][number];
type Actions = { onMark: (p: Panel) => void; onPhoto: (p: Panel, file: File) => void; busy: string | null; error: { placementId: string; error: unknown } | null };

// The panels of one surface as a list that works on a phone: code, where it goes from the
// datum, its size, whether it is installed, and a site photo taken on the spot.
export function PanelList({ surfaceName, panels, units, actions }: { surfaceName: string; panels: Panel[]; units: UnitPreference; actions: Actions | null }) {
  const len = (m: number) => formatLength(m, units, { scale: "panel" });
  return (
    <ul className="flex flex-col divide-y divide-ink/10 rounded-sheet border border-ink/20 bg-white/60" aria-label={`Panels on ${surfaceName}`}>
      {panels.map((p) => {
        const done = Boolean(p.installedAt);
        const failed = actions?.error?.placementId === p.id && actions.error.error instanceof ApiError ? actions.error.error : null;
        return (
          <li key={p.id} className="flex flex-col gap-2 px-3 py-2.5 sm:flex-row sm:items-center sm:justify-between" data-testid="panel-row" data-code={p.code} data-installed={done || undefined}>
            <div className="min-w-0">
              <p className="font-semibold">
                {p.code} <span className="text-xs font-normal text-ink-soft">type {p.type}</span>
              </p>
              <p className="figures text-xs text-ink-soft">
                <abbr title="across from the datum">x</abbr> {len(p.x)}, <abbr title="up from the datum">y</abbr> {len(p.y)} · {len(p.width)} × {len(p.height)}
              </p>
              <p className="text-xs">{done ? `Installed ${formatDay(p.installedAt!)} by ${p.installedBy}` : "Not installed yet"}</p>
              {failed && (
                <p role="alert" className="text-xs font-medium text-fault">
                  {failed.issues[0]?.message ?? failed.message}
                </p>
              )}
            </div>
            <div className="flex flex-wrap items-center gap-2 sm:shrink-0 sm:flex-nowrap">
              {p.photo && (
                <a href={p.photo.url} target="_blank" rel="noopener" className="text-xs font-semibold text-copper-deep underline-offset-4 hover:underline">
                  Photo<span className="sr-only"> of {p.code} on {surfaceName}</span>
                </a>
              )}
              {actions && (
                <>
                  <label className="cursor-pointer rounded-sheet border border-ink/40 px-2.5 py-1.5 text-xs font-medium focus-within:outline focus-within:outline-2 focus-within:outline-copper">
                    {p.photo ? "Replace photo" : "Add photo"}
                    <span className="sr-only"> of {p.code} on {surfaceName}</span>
                    <input
                      type="file"
                      accept="image/jpeg,image/png,image/webp"
                      capture="environment"
                      className="sr-only"
                      disabled={actions.busy === p.id}
                      onChange={(e) => {
                        const file = e.target.files?.[0];
                        if (file) actions.onPhoto(p, file);
                        e.target.value = "";
                      }}
                    />
                  </label>
                  <button
                    type="button"
                    aria-pressed={done}
                    disabled={actions.busy === p.id}
                    onClick={() => actions.onMark(p)}
                    className={`rounded-sheet border px-2.5 py-1.5 text-xs font-semibold ${done ? "border-sage bg-sage-soft text-ink" : "border-ink bg-ink text-paper"}`}
                  >
                    {done ? "Installed ✓" : "Mark installed"}
                    <span className="sr-only"> {p.code} on {surfaceName}</span>
                  </button>
                </>
              )}
            </div>
          </li>
        );
      })}
    </ul>
  );
}
