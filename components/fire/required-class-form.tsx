"use client";

import { useState, type FormEvent } from "react";
import { requiredFireClassField } from "@/lib/schemas/fire";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";

// A required fire class typed in either system ("B-s1,d0", "Class A"); read by the same schema
// as the server's, stored and shown back as Cavitas prints it. Saving an empty field clears it.
export function RequiredClassForm(props: { name: string; label: string; value: string | null; hint: string; serverError?: string; saving: boolean; onSave: (value: string | null) => Promise<unknown> }) {
  const [text, setText] = useState(props.value ?? "");
  const [error, setError] = useState<string | null>(null);
  const changed = text.trim() !== (props.value ?? "");

  async function submit(e: FormEvent) {
    e.preventDefault();
    if (!changed) return;
    const parsed = requiredFireClassField.safeParse(text);
    if (!parsed.success) return setError(parsed.error.issues[0].message);
    setError(null);
    await props.onSave(parsed.data).then(() => setText(parsed.data ?? ""), () => undefined);
  }

  return (
    <form onSubmit={submit} className="flex flex-wrap items-end gap-3" noValidate>
      <TextField
        className="w-64"
        name={props.name}
        label={props.label}
        value={text}
        onChange={(e) => {
          setText(e.target.value);
          setError(null);
        }}
        error={error ?? props.serverError}
        hint={props.hint}
        placeholder="e.g. B-s1,d0 or Class A"
      />
      <Button type="submit" tone="plain" disabled={!changed || props.saving}>
        {props.saving ? "Saving…" : "Save"}
      </Button>
    </form>
  );
}
