"use client";

import { useRouter } from "next/navigation";
import { useQuery } from "@tanstack/react-query";
import { useState, type FormEvent } from "react";
import type { Me } from "@/lib/services/settings";
import { meQuery, useUpdateSettings } from "@/lib/queries/account";
import { ApiError } from "@/lib/queries/api";
import { formatArea, formatLength, type UnitPreference } from "@/lib/units";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { Sheet, TitleBlock } from "@/components/ui/sheet";

const SAMPLES = [
  { label: "Hole diameter", metres: 0.008, scale: "fine" },
  { label: "Cavity depth", metres: 0.2, scale: "panel" },
  { label: "Wall length", metres: 12.5, scale: "room" },
] as const;

export function SettingsForm({ initial }: { initial: Me }) {
  const router = useRouter();
  const { data: me = initial } = useQuery({ ...meQuery(), initialData: initial });
  const update = useUpdateSettings();
  const [units, setUnits] = useState<UnitPreference>(me.unitPreference);
  const [saved, setSaved] = useState(false);
  const err = update.error instanceof ApiError ? update.error : null;

  async function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    setSaved(false);
    const name = String(new FormData(e.currentTarget).get("name") ?? "");
    const result = await update.mutateAsync({ name, unitPreference: units }).catch(() => null);
    if (result) {
      setSaved(true);
      router.refresh();
    }
  }

  return (
    <>
      <TitleBlock kicker="Account" title="Settings" meta={me.firm ? `${me.email} · ${me.firm.name}` : me.email} />
      <form onSubmit={onSubmit} className="grid max-w-3xl gap-8" noValidate>
        {saved && <Notice tone="ok">Settings saved.</Notice>}
        {err && !err.issues.length && <Notice tone="fault">{err.message}</Notice>}
        <Sheet title="You">
          <TextField label="Name" name="name" defaultValue={me.name} error={err?.fieldMessage("name")} />
        </Sheet>
        <Sheet title="Units">
          <fieldset>
            <legend className="mb-3 text-sm text-ink-soft">
              Lengths are stored in metres. Every screen shows and accepts them in the units you choose here; you can still type
              the other system (&quot;19 mm&quot;, &quot;3/4 in&quot;).
            </legend>
            <div className="grid gap-3 sm:grid-cols-2">
              {(["metric", "imperial"] as const).map((u) => (
                <label
                  key={u}
                  className={`flex cursor-pointer flex-col gap-2 rounded-sheet border p-4 ${units === u ? "border-copper bg-copper-soft/30" : "border-paper-edge bg-white/50"}`}
                >
                  <span className="flex items-center gap-2 text-sm font-semibold">
                    <input type="radio" name="unitPreference" value={u} checked={units === u} onChange={() => setUnits(u)} />
                    {u === "metric" ? "Metric (mm, m)" : "Imperial (in, ft)"}
                  </span>
                  <span className="figures text-xs text-ink-soft">
                    {SAMPLES.map((s) => (
                      <span key={s.label} className="block">
                        {s.label}: {formatLength(s.metres, u, { scale: s.scale })}
                      </span>
                    ))}
                    <span className="block">Treated area: {formatArea(24, u)}</span>
                  </span>
                </label>
              ))}
            </div>
            {err?.fieldMessage("unitPreference") && <p className="mt-2 text-xs text-fault">{err.fieldMessage("unitPreference")}</p>}
          </fieldset>
        </Sheet>
        <div>
          <Button type="submit" disabled={update.isPending}>
            {update.isPending ? "Saving…" : "Save settings"}
          </Button>
        </div>
      </form>
    </>
  );
}
