import type { BoardIssue } from "@/lib/board/refusal";
import type { Placement } from "@/lib/board/types";
import { HIGH_ON_WALL } from "@/lib/board/high-panels";
import { formatLength, type UnitPreference } from "@/lib/units";
import type { RoomFire } from "@/lib/fire";
import { Notice } from "@/components/ui/notice";

/** The words of each field the server can name, as the screen labels it. */
export const FIELD_WORDS: Record<string, string> = {
  x: "From the left",
  y: "Above the datum",
  width: "Width",
  height: "Height",
  code: "Panel code",
  buildUpId: "Build-up",
  id: "Panel",
  gridModule: "Grid module",
  placements: "Panels",
  version: "Version",
};

// A save the server refused: each reason in its own words, with the panel it is about (a
// button that selects it, so its fields show the same message).
export function SaveRefusal({ failure, message, issues, onShow }: { failure: "refused" | "retrying"; message: string; issues: readonly BoardIssue[]; onShow: (placementId: string) => void }) {
  if (failure === "retrying") {
    return (
      <Notice tone="caution" title="Not saved yet">
        {message}
      </Notice>
    );
  }
  return (
    <Notice tone="fault" title="Not saved: the server refused this board">
      {issues.length === 0 ? (
        <p>{message}</p>
      ) : (
        <ul className="flex flex-col gap-1" data-testid="save-refusal">
          {issues.map((i, n) => (
            <li key={`${i.placementId}-${i.field}-${n}`}>
              {i.placementId && (
                <button type="button" className="mr-1 font-semibold underline" onClick={() => onShow(i.placementId!)}>
                  {i.code ?? "Panel"}
                </button>
              )}
              <span className="font-semibold">{FIELD_WORDS[i.field] ?? i.field}:</span> {i.message}
            </li>
          ))}
        </ul>
      )}
      <p className="mt-1 text-ink">Your board is kept on this screen; it is sent again when you change it.</p>
    </Notice>
  );
}

// The cautions of SAFETY.md where the decision is made: on a ceiling always, on a wall as soon
// as a panel's top is above head height, naming those panels.
export function InstallCaution({ kind, high, units, onShow }: { kind: string; high: readonly Placement[]; units: UnitPreference; onShow: (ids: string[]) => void }) {
  if (kind === "ceiling") {
    return (
      <Notice tone="caution" title="Overhead panels">
        Panels on a ceiling need fixings rated for their weight and, where required, seismic restraint, designed by a competent person. Follow the manufacturer&apos;s instructions and the governing code.
      </Notice>
    );
  }
  if (high.length === 0) return null;
  const names = high.slice(0, 8).map((p) => p.code ?? "a panel");
  return (
    <Notice tone="caution" title={`Panels high on the wall: ${high.length === 1 ? "1 panel reaches" : `${high.length} panels reach`} above ${formatLength(HIGH_ON_WALL, units)}`}>
      <p data-testid="high-panels">
        <button type="button" className="font-semibold underline" onClick={() => onShow(high.map((p) => p.id))}>
          {names.join(", ")}
          {high.length > names.length ? ` and ${high.length - names.length} more` : ""}
        </button>{" "}
        can fall on people below, and fixing them is work at height. Their fixings must be rated for the load and suit the wall, with seismic restraint where required, designed by a competent person (a structural engineer or the maker&apos;s engineered system). Follow the maker&apos;s instructions, safe practice for work at height, and the governing code.
      </p>
    </Notice>
  );
}

// The fire findings of the build-ups on this board that are flagged (missing, lower, not
// comparable): the same words as the Check and the submittal.
export function FireFlags({ fire, onBoard }: { fire: RoomFire; onBoard: ReadonlySet<string> }) {
  const flagged = fire.findings.filter((f) => f.finding.flagged && onBoard.has(f.buildUpId));
  if (flagged.length === 0) return null;
  return (
    <Notice tone="caution" title={`Fire class: ${flagged.length === 1 ? "1 build-up" : `${flagged.length} build-ups`} on this board flagged`}>
      <ul className="flex flex-col gap-0.5" data-testid="board-fire-flags">
        {flagged.map((f) => (
          <li key={f.buildUpId}>
            <span className="font-semibold">{f.name}:</span> {f.finding.message}
          </li>
        ))}
      </ul>
      <p className="mt-1">The governing code and the authority having jurisdiction decide what is required.</p>
    </Notice>
  );
}
