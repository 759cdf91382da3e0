"use client";

import { useEffect, type KeyboardEvent } from "react";
import { nudge, resizeByKey, stepSelection } from "@/lib/board/selection";
import { MIN_PANEL, type BoardEditor } from "./use-board-editor";

/** 10 mm a press; with Shift, one grid module */
const STEP = 0.01;

// The keyboard on the board. With the board focused: Tab and Shift+Tab step through the panels
// in reading order and then leave the board as Tab always does; arrows move the selection,
// Alt+arrows resize it (Shift: by a grid module); Delete, Ctrl+D and Ctrl+A act on it; Escape
// lets go. Undo and redo work anywhere on the screen outside a text field.
export function useBoardKeys(editor: BoardEditor, opts: { editable: boolean; onEscape: () => void }) {
  const { undo, redo } = editor;
  useEffect(() => {
    function onKey(e: globalThis.KeyboardEvent) {
      const target = e.target as HTMLElement;
      if (target.closest("input, textarea, select")) return;
      const mod = e.ctrlKey || e.metaKey;
      const key = e.key.toLowerCase();
      if (!mod || !opts.editable) return;
      if (key === "z" || key === "y") {
        e.preventDefault();
        if (key === "y" || e.shiftKey) redo();
        else undo();
      }
    }
    window.addEventListener("keydown", onKey);
    return () => window.removeEventListener("keydown", onKey);
  }, [undo, redo, opts.editable]);

  return function onBoardKey(e: KeyboardEvent<HTMLElement>) {
    const { setSelected, gridModule } = editor;
    const { placements, selected } = editor.latest.current;
    const mod = e.ctrlKey || e.metaKey;
    if (e.key === "Tab") {
      const next = stepSelection(placements, [...selected][0] ?? null, e.shiftKey ? -1 : 1);
      if (next === null) return; // past the last panel: the focus moves on
      e.preventDefault();
      setSelected(new Set([next]));
      return;
    }
    if (e.key === "Escape") {
      setSelected(new Set());
      editor.cancelGesture();
      opts.onEscape();
      return;
    }
    if (mod && e.key.toLowerCase() === "a") {
      e.preventDefault();
      setSelected(new Set(placements.map((p) => p.id)));
      return;
    }
    if (!opts.editable || selected.size === 0) return;
    if (e.key === "Delete" || e.key === "Backspace") {
      e.preventDefault();
      editor.removeSelected();
      return;
    }
    if (mod && e.key.toLowerCase() === "d") {
      e.preventDefault();
      editor.duplicateSelected();
      return;
    }
    if (e.key.startsWith("Arrow")) {
      e.preventDefault();
      const steps = { step: STEP, largeStep: gridModule };
      if (e.altKey) editor.change(resizeByKey(placements, selected, e.key, e.shiftKey, steps, MIN_PANEL), "Resize");
      else editor.change(nudge(placements, selected, e.key, e.shiftKey, steps), "Nudge");
    }
  };
}
