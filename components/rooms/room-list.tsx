"use client";

import Link from "next/link";
import { useRouter } from "next/navigation";
import { useQuery } from "@tanstack/react-query";
import { useState, type FormEvent } from "react";
import type { RoomSummary } from "@/lib/services/rooms";
import { roomsQuery, useCreateRoom } from "@/lib/queries/rooms";
import { ApiError } from "@/lib/queries/api";
import { ROOM_USES, ROOM_USE_WORDS } from "@/lib/room-uses";
import { roomSchemas } from "@/lib/schemas/room";
import { fieldIssues } from "@/lib/schemas/parse";
import { formatVolume, type UnitPreference } from "@/lib/units";
import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { MeasureField } from "@/components/ui/measure-field";
import { Notice } from "@/components/ui/notice";
import { RefusalScope, RefusedNotice, useRefusals } from "@/components/ui/refusals";
import { Sheet, TitleBlock } from "@/components/ui/sheet";
import { StatusBadge } from "./status-badge";

const seconds = (s: number | null) => (s === null ? "—" : `${s.toFixed(2)} s`);

export function RoomList({ projectId, initial, mayEdit, units }: { projectId: string; initial: RoomSummary[]; mayEdit: boolean; units: UnitPreference }) {
  const { data: rooms = initial } = useQuery({ ...roomsQuery(projectId), initialData: initial });
  const [creating, setCreating] = useState(false);
  return (
    <>
      <TitleBlock
        kicker="Rooms"
        title="Rooms and their reverberation"
        meta="Each room's mid-frequency reverberation time before and after treatment, against the target for its use."
        actions={mayEdit && !creating ? <Button onClick={() => setCreating(true)}>New room</Button> : undefined}
      />
      {creating && <NewRoomForm projectId={projectId} units={units} onCancel={() => setCreating(false)} />}
      {rooms.length === 0 ? (
        <p className="text-ink-soft">No rooms yet.</p>
      ) : (
        <table className="w-full text-sm" data-testid="rooms-table">
          <thead>
            <tr className="border-b border-ink/40 text-left text-xs uppercase tracking-wider text-ink-soft">
              <th className="py-2 pr-3 font-semibold">Room</th>
              <th className="py-2 pr-3 font-semibold">Use</th>
              <th className="py-2 pr-3 text-right font-semibold">Volume</th>
              <th className="py-2 pr-3 font-semibold">Target</th>
              <th className="py-2 pr-3 text-right font-semibold">Mid-frequency T, before → after</th>
              <th className="py-2 pr-3 font-semibold">Standing</th>
              <th className="py-2 text-right font-semibold">Open pins</th>
            </tr>
          </thead>
          <tbody>
            {rooms.map((r) => (
              <tr key={r.id} className="border-b border-ink/10 hover:bg-white/60">
                <td className="py-2.5 pr-3">
                  <Link href={`/projects/${projectId}/rooms/${r.id}`} className="font-medium underline-offset-4 hover:text-copper-deep hover:underline">
                    {r.name}
                  </Link>
                </td>
                <td className="py-2.5 pr-3 text-ink-soft">{ROOM_USE_WORDS[r.use]}</td>
                <td className="figures py-2.5 pr-3 text-right">{formatVolume(r.volumeM3, units)}</td>
                <td className="py-2.5 pr-3 text-ink-soft">{r.target ?? "none chosen"}</td>
                <td className="figures py-2.5 pr-3 text-right">
                  {r.mean ? `${seconds(r.mean.before)} → ${seconds(r.mean.after)}` : "—"}
                  {r.mean?.high !== null && r.mean?.high !== undefined && <span className="text-ink-faint"> (≤ {r.mean.high.toFixed(2)} s)</span>}
                </td>
                <td className="py-2.5 pr-3">{r.mean ? <StatusBadge status={r.mean.status} /> : <StatusBadge status="no target" />}</td>
                <td className={`figures py-2.5 text-right ${r.openPins ? "text-copper-deep" : "text-ink-faint"}`}>{r.openPins}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </>
  );
}

function NewRoomForm({ projectId, units, onCancel }: { projectId: string; units: UnitPreference; onCancel: () => void }) {
  const router = useRouter();
  const create = useCreateRoom(projectId);
  const refusals = useRefusals();
  const [dims, setDims] = useState({ length: 10, width: 8, height: 3 });
  const [local, setLocal] = useState<{ field: string; message: string }[]>([]);
  const err = create.error instanceof ApiError ? create.error : null;
  const fieldMessage = (field: string) => local.find((i) => i.field === field)?.message ?? err?.fieldMessage(field);

  async function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    // What is sent is what is on screen: not while a field holds text that was refused.
    if (refusals.now().length > 0) return;
    const form = new FormData(e.currentTarget);
    const input = { name: String(form.get("name") ?? ""), use: String(form.get("use")), shape: "shoebox", ...dims };
    // The server's own schema, run here first, in the person's units.
    const checked = roomSchemas(units).create.safeParse(input);
    setLocal(checked.success ? [] : fieldIssues(checked.error));
    if (!checked.success) return;
    const made = await create.mutateAsync(input).catch(() => null);
    if (made) router.push(`/projects/${projectId}/rooms/${made.id}`);
  }

  return (
    <Sheet title="New room" className="mb-8">
      <RefusalScope refusals={refusals}>
      <form onSubmit={onSubmit} className="grid gap-4 md:grid-cols-[2fr_1.4fr_1fr_1fr_1fr]" noValidate data-testid="new-room">
        {err && !err.issues.length && (
          <div className="md:col-span-5">
            <Notice tone="fault">{err.message}</Notice>
          </div>
        )}
        <TextField label="Room name" name="name" error={fieldMessage("name")} autoFocus />
        <SelectField label="Use" name="use" defaultValue="speech" options={ROOM_USES.map((u) => ({ value: u, label: ROOM_USE_WORDS[u] }))} />
        <MeasureField label="Length" metres={dims.length} units={units} scale="room" onChange={(v) => setDims((d) => ({ ...d, length: v }))} error={fieldMessage("length")} />
        <MeasureField label="Width" metres={dims.width} units={units} scale="room" onChange={(v) => setDims((d) => ({ ...d, width: v }))} error={fieldMessage("width")} />
        <MeasureField label="Height" metres={dims.height} units={units} scale="room" onChange={(v) => setDims((d) => ({ ...d, height: v }))} error={fieldMessage("height")} />
        {refusals.refused.length > 0 && (
          <div className="md:col-span-5">
            <RefusedNotice refused={refusals.refused} action="created" />
          </div>
        )}
        <p className="text-xs text-ink-faint md:col-span-5">
          A shoebox makes the four walls, the ceiling and the floor with their sizes; finishes, openings and a free-form surface list are set on the room&apos;s page.
        </p>
        <div className="flex gap-3 md:col-span-5">
          <Button type="submit" disabled={create.isPending || refusals.refused.length > 0}>
            {create.isPending ? "Creating…" : "Create room"}
          </Button>
          <Button type="button" tone="quiet" onClick={onCancel}>
            Cancel
          </Button>
        </div>
      </form>
      </RefusalScope>
    </Sheet>
  );
}
