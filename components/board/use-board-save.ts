"use client";

import { useCallback, useEffect, useRef, useState } from "react";
import type { Placement } from "@/lib/board/types";
import type { BoardView } from "@/lib/services/boards";
import { putBoard } from "@/lib/queries/boards";
import { ApiError } from "@/lib/queries/api";

export type SaveState = "saved" | "pending" | "saving" | "conflict" | "error";

// Every change is saved after a short pause, naming the version it started from. A refusal
// with 409 stops saving and asks the person to reload; nothing is written over.
export function useBoardSave(board: Pick<BoardView, "projectId" | "roomId" | "surfaceKey">, initialVersion: number, enabled: boolean) {
  const [version, setVersion] = useState(initialVersion);
  const [state, setState] = useState<SaveState>("saved");
  const [message, setMessage] = useState<string | null>(null);
  const pending = useRef<{ placements: readonly Placement[]; gridModule: number } | null>(null);
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const inFlight = useRef(false);
  const versionRef = useRef(initialVersion);
  const blocked = useRef(false);

  const flush = useCallback(async () => {
    if (inFlight.current || !pending.current || blocked.current) return;
    const doc = pending.current;
    pending.current = null;
    inFlight.current = true;
    setState("saving");
    try {
      const saved = await putBoard(board, {
        version: versionRef.current,
        gridModule: doc.gridModule,
        placements: doc.placements.map((p) => ({ id: p.id, buildUpId: p.buildUpId, code: p.code ?? p.id.slice(0, 8), x: p.x, y: p.y, width: p.width, height: p.height })),
      });
      versionRef.current = saved.version;
      setVersion(saved.version);
      setState(pending.current ? "pending" : "saved");
      setMessage(null);
    } catch (e) {
      if (e instanceof ApiError && e.status === 409) {
        blocked.current = true;
        setState("conflict");
      } else {
        setState("error");
        pending.current ??= doc;
      }
      setMessage(e instanceof ApiError ? e.message : "The board could not be saved. Your changes are kept on this screen; they will be sent again.");
    } finally {
      inFlight.current = false;
      if (pending.current && !blocked.current) timer.current = setTimeout(flush, 400);
    }
  }, [board]);

  const schedule = useCallback(
    (placements: readonly Placement[], gridModule: number) => {
      if (!enabled || blocked.current) return;
      pending.current = { placements, gridModule };
      setState("pending");
      if (timer.current) clearTimeout(timer.current);
      timer.current = setTimeout(flush, 600);
    },
    [enabled, flush],
  );

  const reset = useCallback((v: number) => {
    blocked.current = false;
    pending.current = null;
    versionRef.current = v;
    setVersion(v);
    setState("saved");
    setMessage(null);
  }, []);

  useEffect(() => () => void (timer.current && clearTimeout(timer.current)), []);
  return { version, state, message, schedule, reset };
}
