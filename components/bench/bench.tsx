"use client";

import { useQuery } from "@tanstack/react-query";
import { useDeferredValue, useMemo, useState } from "react";
import { runEvaluate, type EvaluateOutput } from "@/lib/acoustics/contract";
import { buildUpSchemas } from "@/lib/schemas/build-up";
import { fieldIssues } from "@/lib/schemas/parse";
import type { BuildUpView } from "@/lib/services/build-ups";
import { buildUpsQuery, fetchBuildUp, useSaveBuildUp } from "@/lib/queries/build-ups";
import { ApiError } from "@/lib/queries/api";
import type { UnitPreference } from "@/lib/units";
import { AbsorptionChart, ChartLegend, type Curve } from "@/components/charts/absorption-chart";
import { Button } from "@/components/ui/button";
import { SaveNotices } from "@/components/ui/save-notices";
import { Sheet, TitleBlock } from "@/components/ui/sheet";
import { SelectField, TextField } from "@/components/ui/field";
import { RefusalScope, RefusedNotice, useRefusals } from "@/components/ui/refusals";
import { BuildUpInputs, type Draft } from "./build-up-inputs";
import { RatingsPanel, WarningsList } from "./ratings-panel";

function draftOf(b: BuildUpView): Draft {
  const { id: _id, projectId: _p, version: _v, updatedAt: _u, fireReport: _f, result: _r, ...fields } = b;
  return fields;
}

function curvesOf(result: EvaluateOutput, prefix: string, label: string, compare = false): Curve[] {
  const normal = result.thirdOctaves.map((b) => ({ f: b.f, value: b.normal }));
  const diffuse = result.thirdOctaves.map((b) => ({ f: b.f, value: b.diffuse }));
  return compare
    ? [{ id: `${prefix}-diffuse`, label: `Compared, ${label}: diffuse`, tone: "sage", line: "dotted", points: diffuse }]
    : [
        { id: `${prefix}-diffuse`, label: `${label}: diffuse (field incidence 0–78°)`, tone: "copper", points: diffuse },
        { id: `${prefix}-normal`, label: `${label}: normal incidence`, tone: "ink", line: "dashed", points: normal },
      ];
}

// The tuning bench: edits one build-up with live results computed in the browser by the same
// engine as the server, so what the screen shows is what the API and documents will say.
export function Bench({ initial, units, mayEdit }: { initial: BuildUpView; units: UnitPreference; mayEdit: boolean }) {
  const [saved, setSaved] = useState(initial);
  const [draft, setDraft] = useState<Draft>(() => draftOf(initial));
  const [compareId, setCompareId] = useState("");
  const [conflict, setConflict] = useState<string | null>(null);
  const save = useSaveBuildUp(initial.projectId, initial.id);
  const refusals = useRefusals();
  const { data: library = [] } = useQuery(buildUpsQuery(initial.projectId));

  // The same schema as the server's, with messages in the person's units.
  const schemas = useMemo(() => buildUpSchemas(units), [units]);
  const spec = useDeferredValue(draft.spec);
  const evaluation = useMemo(() => {
    const parsed = schemas.spec.safeParse(spec);
    return parsed.success ? { result: runEvaluate(parsed.data) } : { result: null };
  }, [spec, schemas]);
  const issues = useMemo(() => {
    const parsed = schemas.create.safeParse(draft);
    return parsed.success ? [] : fieldIssues(parsed.error);
  }, [draft, schemas]);
  const [lastGood, setLastGood] = useState<EvaluateOutput>(initial.result);
  if (evaluation.result && evaluation.result !== lastGood) setLastGood(evaluation.result);
  const result = evaluation.result ?? lastGood;

  const dirty = JSON.stringify(draft) !== JSON.stringify(draftOf(saved));
  const fireDeclared = draft.fireStandard !== "none" && draft.fireClass.trim() !== "";
  const serverError = save.error instanceof ApiError ? save.error : null;
  const fieldError = (field: string) => issues.find((e) => e.field === field)?.message ?? serverError?.fieldMessage(field);

  const compare = library.find((b) => b.id === compareId && b.id !== initial.id);
  const curves = [...curvesOf(result, "this", draft.name || "This build-up"), ...(compare ? curvesOf(compare.result, "other", compare.name, true) : [])];

  async function onSave() {
    // A refused field holds text that is not on record: nothing is sent until it is fixed.
    if (refusals.now().length > 0 || issues.length > 0) return;
    setConflict(null);
    try {
      const next = await save.mutateAsync({ ...draft, version: saved.version });
      setSaved(next);
      setDraft(draftOf(next));
    } catch (e) {
      if (e instanceof ApiError && e.status === 409) setConflict(e.message);
    }
  }

  async function reload() {
    const fresh = await fetchBuildUp(initial.projectId, initial.id);
    setSaved(fresh);
    setDraft(draftOf(fresh));
    setConflict(null);
    save.reset();
  }

  return (
    <>
      <TitleBlock
        kicker="Bench"
        title={draft.name || "Untitled build-up"}
        meta={
          <>
            <span data-testid="save-state">
              {dirty ? "Unsaved changes" : `Saved, version ${saved.version}`}
              {!mayEdit && " · read only for your role"}
            </span>
            {" · "}
            <a href="#fire" className={`underline underline-offset-4 ${fireDeclared ? "" : "font-semibold text-ink"}`} data-testid="fire-status">
              {fireDeclared ? `fire class ${draft.fireClass} declared (${draft.fireStandard})` : "no fire class declared"}
            </a>
          </>
        }
        actions={
          mayEdit ? (
            <Button onClick={onSave} disabled={!dirty || save.isPending || issues.length > 0 || refusals.refused.length > 0}>
              {save.isPending ? "Saving…" : "Save build-up"}
            </Button>
          ) : undefined
        }
      />
      <SaveNotices what="build-up" conflict={conflict} onReload={reload} error={serverError} />
      {mayEdit && (
        <div className="mb-6 empty:hidden">
          <RefusedNotice refused={refusals.refused} action="saved" />
        </div>
      )}
      <div className="grid gap-8 lg:grid-cols-[300px_1fr]">
        <RefusalScope refusals={refusals}>
          <fieldset disabled={!mayEdit} data-read-only={mayEdit ? undefined : true} className="flex flex-col gap-6" data-testid="bench-inputs">
            <TextField label="Name" name="name" value={draft.name} onChange={(e) => setDraft({ ...draft, name: e.target.value })} error={fieldError("name")} />
            <BuildUpInputs draft={draft} onChange={setDraft} units={units} fieldError={fieldError} projectId={initial.projectId} fireReport={saved.fireReport} />
          </fieldset>
        </RefusalScope>
        <div className="flex min-w-0 flex-col gap-6">
          <Sheet title="Absorption, one-third octaves">
            <AbsorptionChart
              curves={curves}
              markers={[
                { f: result.peakHz, label: `peak ${Math.round(result.peakHz)} Hz` },
                { f: result.helmholtzHz, label: `lumped ${Math.round(result.helmholtzHz)} Hz` },
              ]}
            />
            <div className="mt-3 flex flex-wrap items-end justify-between gap-4">
              <ChartLegend curves={curves} />
              <SelectField
                label="Compare with"
                name="compare"
                value={compareId}
                onChange={(e) => setCompareId(e.target.value)}
                options={[{ value: "", label: "nothing" }, ...library.filter((b) => b.id !== initial.id).map((b) => ({ value: b.id, label: b.name }))]}
              />
            </div>
          </Sheet>
          <div className="grid gap-6 md:grid-cols-2">
            <Sheet title="Ratings">
              <RatingsPanel result={result} stale={!evaluation.result} />
            </Sheet>
            <Sheet title="Model notes">
              <WarningsList warnings={result.warnings} />
              <p className="mt-3 text-[11px] leading-relaxed text-ink-faint">
                Rigid facing, no panel vibration, infinitely large panel. Predictions are estimates, not laboratory measurements.
              </p>
            </Sheet>
          </div>
          <Sheet title="Band values">
            <BandTable result={result} />
          </Sheet>
        </div>
      </div>
    </>
  );
}

function BandTable({ result }: { result: EvaluateOutput }) {
  return (
    <div className="overflow-x-auto">
      <table className="figures w-full text-xs" data-testid="band-table">
        <tbody>
          <tr className="text-ink-faint">
            <th className="pr-2 text-left font-normal">Hz</th>
            {result.thirdOctaves.map((b) => (
              <th key={b.f} className="px-1 text-right font-normal">
                {b.f >= 1000 ? `${b.f / 1000}k` : b.f}
              </th>
            ))}
          </tr>
          <tr>
            <th className="pr-2 text-left font-normal text-ink-soft">diffuse</th>
            {result.thirdOctaves.map((b) => (
              <td key={b.f} className="px-1 text-right" data-testid={`diffuse-${b.f}`}>
                {b.diffuse.toFixed(2)}
              </td>
            ))}
          </tr>
          <tr>
            <th className="pr-2 text-left font-normal text-ink-soft">normal</th>
            {result.thirdOctaves.map((b) => (
              <td key={b.f} className="px-1 text-right text-ink-soft">
                {b.normal.toFixed(2)}
              </td>
            ))}
          </tr>
        </tbody>
      </table>
    </div>
  );
}
