"use client";

import { useState } from "react";
import type { PinView } from "@/lib/services/boards";
import { refusalFor } from "./refusal-words";
import { RoleBadge } from "@/components/ui/role-badge";

type Actions = ReturnType<typeof import("@/lib/queries/boards").usePinActions>;

// Review pins of this board: the open ones first, each with its thread; the consultant
// resolves, anyone who may pin replies.
export function PinsPanel({ pins, actions, selected, onSelect, may }: { pins: PinView[]; actions: Actions; selected: number | null; onSelect: (n: number | null) => void; may: { pin: boolean; resolve: boolean } }) {
  const sorted = [...pins].sort((a, b) => Number(Boolean(a.resolved)) - Number(Boolean(b.resolved)) || a.number - b.number);
  if (pins.length === 0) return <p className="text-xs text-ink-faint">No pins on this board. {may.pin && "Choose Pin and click the board to leave a comment at a point."}</p>;
  return (
    <ul className="flex flex-col gap-2" data-testid="pins">
      {sorted.map((p) => (
        <PinItem key={p.id} pin={p} open={selected === p.number} onToggle={() => onSelect(selected === p.number ? null : p.number)} actions={actions} may={may} />
      ))}
    </ul>
  );
}

function PinItem({ pin, open, onToggle, actions, may }: { pin: PinView; open: boolean; onToggle: () => void; actions: Actions; may: { pin: boolean; resolve: boolean } }) {
  const [reply, setReply] = useState("");
  // The server's own words for a refused reply (an empty one, one too long), under the field.
  const refused = actions.reply.variables?.pinId === pin.id ? refusalFor(actions.reply.error, "body") : null;
  return (
    <li data-pin={pin.number} className={`rounded-sheet border px-3 py-2 text-xs ${pin.resolved ? "border-ink/15 bg-white/40 text-ink-soft" : "border-copper/50 bg-white/70"}`}>
      <button type="button" className="flex w-full items-start gap-2 text-left" onClick={onToggle}>
        <span className={`figures inline-flex h-5 w-5 shrink-0 items-center justify-center rounded-full text-[10px] font-semibold ${pin.resolved ? "bg-ink/20 text-ink" : "bg-copper-deep text-paper"}`}>{pin.number}</span>
        <span className="min-w-0">
          <span className="block">{pin.body}</span>
          <span className="mt-0.5 block text-[10px] text-ink-faint">
            {pin.author.name} · {pin.replies.length} {pin.replies.length === 1 ? "reply" : "replies"}
            {pin.resolved ? ` · resolved by ${pin.resolved.by}` : " · open"}
          </span>
        </span>
      </button>
      {open && (
        <div className="mt-2 border-t border-ink/10 pt-2">
          <ul className="flex flex-col gap-1.5">
            {pin.replies.map((r) => (
              <li key={r.id}>
                <span className="font-medium">{r.author.name}</span> {r.author.role && <RoleBadge role={r.author.role} />}
                <span className="block">{r.body}</span>
              </li>
            ))}
          </ul>
          {may.pin && (
            <form
              className="mt-2 flex flex-col gap-1"
              onSubmit={async (e) => {
                e.preventDefault();
                if (await actions.reply.mutateAsync({ pinId: pin.id, body: reply }).catch(() => null)) setReply("");
              }}
            >
              <label className="sr-only" htmlFor={`reply-${pin.id}`}>
                Reply to pin {pin.number}
              </label>
              <textarea
                id={`reply-${pin.id}`}
                value={reply}
                onChange={(e) => setReply(e.target.value)}
                rows={2}
                aria-invalid={refused ? true : undefined}
                aria-describedby={refused ? `reply-${pin.id}-error` : undefined}
                className={`rounded-sheet border bg-white/80 px-2 py-1 ${refused ? "border-fault" : "border-paper-edge"}`}
              />
              {refused && (
                <p id={`reply-${pin.id}-error`} role="alert" className="font-medium text-fault">
                  {refused}
                </p>
              )}
              <div className="flex gap-3">
                <button type="submit" className="font-semibold text-copper-deep hover:underline">
                  Reply
                </button>
                {may.resolve && (
                  <button type="button" className="text-ink-soft hover:underline" onClick={() => actions.resolve.mutate({ pinId: pin.id, resolved: !pin.resolved })}>
                    {pin.resolved ? "Open again" : "Resolve"}
                  </button>
                )}
              </div>
            </form>
          )}
        </div>
      )}
    </li>
  );
}
