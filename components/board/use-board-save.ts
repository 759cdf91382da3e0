"use client";

import { useCallback, useEffect, useMemo, useRef, useState } from "react";
import type { Placement } from "@/lib/board/types";
import type { BoardView } from "@/lib/services/boards";
import { createAutosave, type AutosaveSnapshot, type Outcome } from "@/lib/board/autosave";
import { boardIssues, type BoardIssue } from "@/lib/board/refusal";
import { putBoard } from "@/lib/queries/boards";
import { ApiError } from "@/lib/queries/api";

type Doc = { placements: readonly Placement[]; gridModule: number };

const classify = (e: unknown): Outcome => (e instanceof ApiError && e.status === 409 ? "conflict" : e instanceof ApiError && e.status >= 400 && e.status < 500 ? "refused" : "retry");

// The board's autosave (lib/board/autosave.ts) with the server's answer in words: a refusal
// is read back onto the panels and fields it names.
export function useBoardSave(board: Pick<BoardView, "projectId" | "roomId" | "surfaceKey">, initialVersion: number, enabled: boolean) {
  const [snap, setSnap] = useState<AutosaveSnapshot<Doc>>({ state: "saved", version: initialVersion, error: null, refused: null });
  const where = useRef(board);
  const saver = useMemo(
    () =>
      createAutosave<Doc>({
        version: initialVersion,
        classify,
        onChange: setSnap,
        send: (doc, version) =>
          putBoard(where.current, {
            version,
            gridModule: doc.gridModule,
            placements: doc.placements.map((p) => ({ id: p.id, buildUpId: p.buildUpId, code: p.code ?? p.id.slice(0, 8), x: p.x, y: p.y, width: p.width, height: p.height })),
          }),
      }),
    [], // eslint-disable-line react-hooks/exhaustive-deps -- one saver for the screen's life
  );
  useEffect(() => () => saver.dispose(), [saver]);

  const error = snap.error;
  const message =
    error instanceof ApiError
      ? error.message
      : error
        ? "The board could not be saved (the server did not answer). Your changes are kept on this screen and will be sent again."
        : null;
  const issues: BoardIssue[] = useMemo(
    () => (error instanceof ApiError && snap.refused ? boardIssues(error.issues, { placements: snap.refused.placements }) : []),
    [error, snap.refused],
  );
  // Stable functions: the board's memoised panels take callbacks that use them.
  const schedule = useCallback((placements: readonly Placement[], gridModule: number) => void (enabled && saver.schedule({ placements, gridModule })), [enabled, saver]);
  const reset = useCallback((v: number) => saver.reset(v), [saver]);
  /** why the last send failed, while it stands: refused by the server, or not answered (sent again) */
  const failure = error === null || snap.state === "conflict" ? null : classify(error) === "refused" ? ("refused" as const) : ("retrying" as const);
  return { version: snap.version, state: snap.state, message, issues, failure, schedule, reset };
}
