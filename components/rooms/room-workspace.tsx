"use client";

import { useMemo, useState } from "react";
import { useQuery } from "@tanstack/react-query";
import type { RoomView } from "@/lib/services/rooms";
import type { MaterialView } from "@/lib/services/materials";
import type { BuildUpView } from "@/lib/services/build-ups";
import { roomSchemas, type RoomFields } from "@/lib/schemas/room";
import { fieldIssues } from "@/lib/schemas/parse";
import { roomIssues, runCheck, surfacesFor, checkInputFor, type PanelAlpha } from "@/lib/room-model";
import { octaveAlphaFromBands } from "@/lib/rooms/octaves";
import { roomQuery, useSaveRoom } from "@/lib/queries/rooms";
import { ApiError } from "@/lib/queries/api";
import { ROOM_USE_WORDS } from "@/lib/room-uses";
import { formatArea, formatVolume, type UnitPreference } from "@/lib/units";
import Link from "next/link";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { RefusalScope, RefusedNotice, useRefusals } from "@/components/ui/refusals";
import { SaveNotices } from "@/components/ui/save-notices";
import { TitleBlock } from "@/components/ui/sheet";
import { RoomFirePanel } from "@/components/fire/room-fire-panel";
import { CheckPanel } from "./check-panel";
import { FinishSources } from "./finish-sources";
import { RoomFieldsEditor } from "./room-fields-editor";
import { SurfacesEditor } from "./surfaces-editor";
import { TreatmentsEditor } from "./treatments-editor";

function fieldsOf(room: RoomView): RoomFields {
  const { id: _i, projectId: _p, version: _v, updatedAt: _u, volumeM3: _vol, targetResolved: _t, check: _c, warnings: _w, placed: _pl, openPins: _op, fire: _f, surfaces, ...rest } = room;
  return { ...rest, surfaces: surfaces.map(({ grossArea: _g, netArea: _n, ...s }) => s) };
}

type Props = { initial: RoomView; materials: MaterialView[]; buildUps: BuildUpView[]; units: UnitPreference; mayEdit: boolean };

// A room: its check on top, recomputed in the browser as the model below is edited (the same
// code as the server's), then the model itself. Saves name the version they started from.
export function RoomWorkspace({ initial, materials, buildUps, units, mayEdit }: Props) {
  const { data: saved = initial, refetch } = useQuery({ ...roomQuery(initial.projectId, initial.id), initialData: initial });
  const [draft, setDraft] = useState<RoomFields>(() => fieldsOf(initial));
  const [base, setBase] = useState(initial.version);
  const [conflict, setConflict] = useState<string | null>(null);
  const save = useSaveRoom(initial.projectId, initial.id);
  const refusals = useRefusals();

  const panels = useMemo(() => new Map<string, PanelAlpha>(buildUps.map((b) => [b.id, { name: b.name, alpha: octaveAlphaFromBands(b.result.octaves) }])), [buildUps]);
  const lookup = useMemo(() => {
    const byKey = new Map(materials.map((m) => [m.key, m.alpha]));
    return (key: string) => byKey.get(key);
  }, [materials]);
  const surfaces = useMemo(() => surfacesFor(draft), [draft]);
  // The server's own checks, run here first: the shared schema (sizes a practitioner would
  // accept) and what the room's numbers must satisfy together, in the person's units.
  const schemas = useMemo(() => roomSchemas(units), [units]);
  const issues = useMemo(() => {
    const shape = schemas.create.safeParse(draft);
    const refused = shape.success ? [] : fieldIssues(shape.error).map((i) => ({ ...i, severity: "error" as const }));
    return [...refused, ...roomIssues(draft, surfaces, panels, lookup, units)];
  }, [schemas, draft, surfaces, panels, lookup, units]);
  const errors = issues.filter((i) => i.severity === "error");
  const live = useMemo(
    () => (errors.length ? null : runCheck({ fields: draft, surfaces, treatments: [...draft.treatments, ...saved.placed], panels, lookup })),
    [draft, surfaces, panels, lookup, errors.length, saved.placed],
  );
  const checkInput = useMemo(
    () => (errors.length ? null : checkInputFor({ fields: draft, surfaces, treatments: [...draft.treatments, ...saved.placed], panels, lookup }).input),
    [draft, surfaces, panels, lookup, errors.length, saved.placed],
  );

  const serverError = save.error instanceof ApiError ? save.error : null;
  const fieldError = (field: string) => errors.find((e) => e.field === field)?.message ?? serverError?.fieldMessage(field);
  const dirty = JSON.stringify(draft) !== JSON.stringify(fieldsOf(saved)) || base !== saved.version;

  async function onSave() {
    // A refused field holds text that is not on record: nothing is sent until it is fixed.
    if (refusals.now().length > 0 || errors.length > 0) return;
    setConflict(null);
    try {
      const next = await save.mutateAsync({ ...draft, version: base });
      setDraft(fieldsOf(next));
      setBase(next.version);
    } catch (e) {
      if (e instanceof ApiError && e.status === 409) setConflict(e.message);
    }
  }

  async function reload() {
    const fresh = (await refetch()).data;
    if (fresh) {
      setDraft(fieldsOf(fresh));
      setBase(fresh.version);
    }
    setConflict(null);
    save.reset();
  }

  const volume = live?.check.ok ? checkInput?.volume : saved.volumeM3;
  return (
    <>
      <TitleBlock
        kicker="Room"
        title={draft.name || "Untitled room"}
        meta={
          <span data-testid="room-meta">
            {ROOM_USE_WORDS[draft.use]} · {volume ? formatVolume(volume, units) : "volume unknown"} · {dirty ? "unsaved changes" : `saved, version ${base}`}
            {!mayEdit && " · read only for your role"}
          </span>
        }
        actions={
          mayEdit ? (
            <Button onClick={onSave} disabled={!dirty || save.isPending || errors.length > 0 || refusals.refused.length > 0}>
              {save.isPending ? "Saving…" : "Save room"}
            </Button>
          ) : undefined
        }
      />
      <SaveNotices what="room" conflict={conflict} onReload={reload} error={serverError} />
      {mayEdit && (
        <div className="mb-6 empty:hidden">
          <RefusedNotice refused={refusals.refused} action="saved" />
        </div>
      )}
      <nav aria-label="Elevation boards" className="mb-6 flex flex-wrap items-center gap-2 text-xs" data-testid="board-links">
        <span className="font-semibold uppercase tracking-wider text-ink-soft">Boards</span>
        {saved.surfaces.map((s) => {
          const area = saved.placed.filter((l) => l.surfaceKey === s.key).reduce((a, l) => a + l.area, 0);
          return (
            <Link key={s.key} href={`/projects/${saved.projectId}/rooms/${saved.id}/board/${s.key}`} className="rounded-sheet border border-ink/25 bg-white/60 px-2 py-1 hover:border-copper hover:text-copper-deep">
              {s.name}
              {area > 0 && <span className="figures ml-1 text-ink-faint">{formatArea(area, units)}</span>}
            </Link>
          );
        })}
        {saved.openPins > 0 && <span className="ml-2 text-copper-deep">{saved.openPins} open {saved.openPins === 1 ? "pin" : "pins"}</span>}
      </nav>
      {live ? (
        <>
          <CheckPanel check={live.check} target={live.target} units={units} />
          <div className="mt-6">
            <FinishSources surfaces={surfaces} materials={materials} />
          </div>
        </>
      ) : (
        <Notice tone="caution" title="Fix the marked fields to see the check">
          {errors.length} {errors.length === 1 ? "field needs" : "fields need"} attention below. Nothing has been saved or lost.
        </Notice>
      )}
      <div className="mt-6">
        <RoomFirePanel room={saved} mayEdit={mayEdit} />
      </div>
      <RefusalScope refusals={refusals}>
        <fieldset disabled={!mayEdit} data-read-only={mayEdit ? undefined : true} className="mt-8 grid gap-6 xl:grid-cols-[1fr_1.6fr]" data-testid="room-inputs">
          <RoomFieldsEditor draft={draft} onChange={setDraft} units={units} fieldError={fieldError} />
          <div className="flex flex-col gap-6">
            <SurfacesEditor draft={draft} onChange={setDraft} surfaces={surfaces} materials={materials} units={units} fieldError={fieldError} editable={mayEdit} />
            <TreatmentsEditor draft={draft} onChange={setDraft} surfaces={surfaces} buildUps={buildUps} panels={panels} checkInput={checkInput} units={units} fieldError={fieldError} editable={mayEdit} />
          </div>
        </fieldset>
      </RefusalScope>
    </>
  );
}
