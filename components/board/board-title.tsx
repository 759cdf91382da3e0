import Link from "next/link";
import type { RoomView } from "@/lib/services/rooms";
import type { AutosaveState } from "@/lib/board/autosave";
import { TitleBlock } from "@/components/ui/sheet";

const SAVE_WORDS: Record<AutosaveState, string> = {
  saved: "saved",
  pending: "changes waiting to be saved",
  saving: "saving…",
  conflict: "not saved: someone else changed this board",
  refused: "not saved: the server refused a value (see above)",
  error: "not saved yet: trying again",
};

// The board's title block: room and surface, how the save stands, and links to the room's
// other surfaces.
export function BoardTitle(p: { room: RoomView; surfaceKey: string; surfaceName: string; save: { state: AutosaveState; version: number }; panels: number; openPins: number; mayEdit: boolean }) {
  return (
    <TitleBlock
      kicker={`Board · ${p.room.name}`}
      title={p.surfaceName}
      meta={
        <span className="flex flex-wrap items-center gap-3">
          <span data-testid="board-save-state">
            {p.save.state === "saved" ? `saved, version ${p.save.version}` : SAVE_WORDS[p.save.state]}
          </span>
          <span>
            · {p.panels} {p.panels === 1 ? "panel" : "panels"}
          </span>
          <span>
            · {p.openPins} open {p.openPins === 1 ? "pin" : "pins"}
          </span>
          {!p.mayEdit && <span>· read only: you may pin, not move panels</span>}
        </span>
      }
      actions={
        <nav className="flex flex-wrap gap-1 text-xs" aria-label="Surfaces">
          {p.room.surfaces.map((l) => (
            <Link
              key={l.key}
              href={`/projects/${p.room.projectId}/rooms/${p.room.id}/board/${l.key}`}
              aria-current={l.key === p.surfaceKey ? "page" : undefined}
              className={`rounded-sheet border px-2 py-1 ${l.key === p.surfaceKey ? "border-copper bg-copper-soft/40 text-ink" : "border-ink/20 text-ink-soft hover:text-ink"}`}
            >
              {l.name}
            </Link>
          ))}
        </nav>
      }
    />
  );
}
