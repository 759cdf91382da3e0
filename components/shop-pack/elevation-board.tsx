"use client";

import type { SnapshotSurface } from "@/lib/submittals/snapshot";
import type { SubmittalView } from "@/lib/services/submittals";
import { canvasHeightFor, fitToView, rectToScreen } from "@/lib/board/view";

type Panel = NonNullable<SubmittalView["install"]>["placements"][number];
const WIDTH = 880;
const MARGIN = 24;

// A surface of the approved revision face on, drawn with the board's own view arithmetic
// (lib/board/view.ts), so every panel sits where the Board and the shop drawing put it.
// Installed panels are filled sage with a tick. The installer taps a panel to mark it; the
// list below does the same from the keyboard or a phone.
export function ElevationBoard({ surface, panels, onToggle }: { surface: SnapshotSurface; panels: Panel[]; onToggle: ((p: Panel) => void) | null }) {
  const height = canvasHeightFor(surface, WIDTH, { min: 140, max: 420, margin: MARGIN });
  const view = fitToView(surface, { width: WIDTH, height }, MARGIN);
  const outline = rectToScreen(view, { x: 0, y: 0, width: surface.width, height: surface.height });
  const installed = panels.filter((p) => p.installedAt).length;
  return (
    <figure className="flex flex-col gap-1">
      <svg
        viewBox={`0 0 ${WIDTH} ${height}`}
        className="w-full rounded-sheet border border-ink/25 bg-white/70"
        role="img"
        aria-label={`${surface.name}: ${panels.length} panels, ${installed} installed`}
        data-testid={`elevation-${surface.key}`}
      >
        <rect {...outline} fill="#fffdf8" stroke="#1a2740" strokeWidth={1.5} />
        {surface.openings.map((o, i) => {
          const r = rectToScreen(view, o);
          return <rect key={i} {...r} fill="#ece5d6" stroke="#44506a" strokeDasharray="4 3" />;
        })}
        {panels.map((p) => {
          const r = rectToScreen(view, p);
          const done = Boolean(p.installedAt);
          return (
            <g key={p.id} data-code={p.code} data-installed={done || undefined} onClick={onToggle ? () => onToggle(p) : undefined} className={onToggle ? "cursor-pointer" : undefined}>
              <rect {...r} fill={done ? "#d9e4d6" : "#efe9dc"} stroke={done ? "#4f6f52" : "#1a2740"} strokeWidth={done ? 2 : 1} />
              {r.width > 30 && r.height > 14 && (
                <text x={r.x + 3} y={r.y + 11} fontSize={9} fill="#1a2740">
                  {p.code}
                </text>
              )}
              {done && r.width > 14 && r.height > 14 && (
                <path d={`M ${r.x + r.width / 2 - 5} ${r.y + r.height / 2} l 4 4 l 7 -8`} fill="none" stroke="#4f6f52" strokeWidth={2} />
              )}
            </g>
          );
        })}
      </svg>
      <figcaption className="flex justify-between text-xs text-ink-soft">
        <span>{surface.name}, seen face on; set-out from its lower-left corner.</span>
        <span className="figures">{`${installed} of ${panels.length} installed`}</span>
      </figcaption>
    </figure>
  );
}
