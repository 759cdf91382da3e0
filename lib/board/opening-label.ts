/** How the board's messages name an opening: its own name, else the kind's word ("the door"). */
import type { BoardOpening } from "./types";

const KIND_WORDS: Record<BoardOpening["kind"], string> = {
  door: "the door",
  window: "the window",
  glazing: "the glazing",
  vent: "the vent",
  other: "the opening",
};

export const openingLabel = (o: Pick<BoardOpening, "kind" | "name">) => o.name?.trim() || KIND_WORDS[o.kind] || "the opening";
