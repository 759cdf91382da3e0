"use client";

import { useId, useState, type FormEvent } from "react";
import type { SubmittalView } from "@/lib/services/submittals";
import { useDecide } from "@/lib/queries/submittals";
import { ApiError } from "@/lib/queries/api";
import { Button } from "@/components/ui/button";
import { FIELD_LABEL, FieldNote, TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { Sheet } from "@/components/ui/sheet";
import { Working } from "./working";

const OUTCOMES = [
  { value: "approved", label: "Approve", hint: "Build it as issued." },
  { value: "approved-as-noted", label: "Approve as noted", hint: "Build it, taking your notes into account." },
  { value: "returned", label: "Return for revision", hint: "Nothing is built; the consultant revises it and issues the next revision." },
] as const;

// The client's decision on the PDF they read, signed by typing their full name. The server's
// refusals land at their fields; a refusal of the whole (the state changed meanwhile) above.
export function DecisionForm({ view, onDecided }: { view: SubmittalView; onDecided: () => void }) {
  const id = useId();
  const decide = useDecide(view.projectId, view.id);
  const [outcome, setOutcome] = useState<(typeof OUTCOMES)[number]["value"] | "">("");
  const error = decide.error instanceof ApiError ? decide.error : null;
  const at = (field: string) => error?.fieldMessage(field);
  const whole = error && !["signature", "notes", "outcome"].some((f) => at(f)) ? error.message : null;

  async function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    const done = await decide
      .mutateAsync({ outcome, signature: String(form.get("signature") ?? ""), notes: String(form.get("notes") ?? ""), pdfSha256: view.pdf?.sha256 ?? "" })
      .catch(() => null);
    if (done) onDecided();
  }

  return (
    <Sheet title="Your decision">
      <form onSubmit={submit} className="flex flex-col gap-4" data-testid="decision-form" noValidate>
        <fieldset aria-describedby={at("outcome") ? `${id}-outcome-error` : undefined}>
          <legend className={FIELD_LABEL}>Decision on revision {view.letter}</legend>
          <div className="mt-2 flex flex-col gap-2">
            {OUTCOMES.map((o) => (
              <label key={o.value} className="flex items-start gap-2 text-sm">
                <input type="radio" name="outcome" value={o.value} checked={outcome === o.value} onChange={() => setOutcome(o.value)} className="mt-1" />
                <span>
                  <span className="font-semibold">{o.label}</span> <span className="text-ink-soft">{o.hint}</span>
                </span>
              </label>
            ))}
          </div>
          <FieldNote id={`${id}-outcome`} error={at("outcome")} />
        </fieldset>
        <div className="flex flex-col gap-1">
          <label htmlFor={`${id}-notes`} className={FIELD_LABEL}>
            Notes{outcome === "approved" ? " (optional)" : ""}
          </label>
          <textarea
            id={`${id}-notes`}
            name="notes"
            rows={3}
            aria-invalid={at("notes") ? true : undefined}
            aria-describedby={at("notes") ? `${id}-notes-error` : undefined}
            className={`rounded-sheet border bg-white/70 px-3 py-2 text-sm ${at("notes") ? "border-fault" : "border-paper-edge"}`}
          />
          <FieldNote id={`${id}-notes`} error={at("notes")} hint={outcome === "returned" ? "Say what must change." : outcome === "approved-as-noted" ? "What your approval is subject to." : undefined} />
        </div>
        <TextField
          id={`${id}-signature`}
          name="signature"
          label="Type your full name to sign"
          autoComplete="name"
          error={at("signature")}
          hint={`As your account has it: ${view.signAs}. Typing it signs this decision.`}
        />
        <p className="text-xs text-ink-soft">
          You decide on the PDF with SHA-256 <span className="figures break-all text-ink">{view.pdf?.sha256}</span>. It is recorded with your decision.
        </p>
        {whole && <Notice tone="fault">{whole}</Notice>}
        {decide.isPending ? (
          <Working what="Recording your decision and making its documents" expectSeconds={outcome === "returned" ? 1 : 4} />
        ) : (
          <div>
            <Button type="submit" disabled={!outcome}>
              Sign and send
            </Button>
          </div>
        )}
      </form>
    </Sheet>
  );
}
