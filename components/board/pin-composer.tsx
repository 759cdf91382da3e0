"use client";

import { useEffect, useId, useRef, useState } from "react";
import { refusalFor } from "./refusal-words";

// The comment of a new pin, written where it was placed (on bare surface or on a panel).
export function PinComposer({ onSubmit, onCancel, error, onPanel }: { onSubmit: (body: string) => void; onCancel: () => void; error: unknown; onPanel: string | null }) {
  const [body, setBody] = useState("");
  const id = useId();
  const message = refusalFor(error, "body");
  const field = useRef<HTMLTextAreaElement>(null);
  // Focused once the press that placed the pin is over (a press on the board focuses the board).
  useEffect(() => {
    const t = setTimeout(() => field.current?.focus(), 0);
    return () => clearTimeout(t);
  }, []);
  return (
    <form
      className="absolute bottom-3 left-3 right-3 flex flex-col gap-2 rounded-sheet border border-copper bg-paper p-3 shadow"
      onSubmit={(e) => {
        e.preventDefault();
        onSubmit(body);
      }}
      onKeyDown={(e) => e.key === "Escape" && onCancel()}
    >
      <label htmlFor={`${id}-body`} className="text-xs font-semibold text-ink-soft">
        Comment at this point{onPanel ? ` (on panel ${onPanel})` : ""}
      </label>
      <textarea
        id={`${id}-body`}
        ref={field}
        rows={2}
        value={body}
        onChange={(e) => setBody(e.target.value)}
        aria-invalid={message ? true : undefined}
        aria-describedby={message ? `${id}-error` : undefined}
        className={`rounded-sheet border bg-white/80 px-2 py-1 text-sm ${message ? "border-fault" : "border-paper-edge"}`}
      />
      {message && (
        <p id={`${id}-error`} role="alert" className="text-xs font-medium text-fault">
          {message}
        </p>
      )}
      <div className="flex gap-3 text-sm">
        <button type="submit" className="font-semibold text-copper-deep hover:underline">
          Place pin
        </button>
        <button type="button" className="text-ink-soft hover:underline" onClick={onCancel}>
          Cancel
        </button>
      </div>
    </form>
  );
}
