"use client";

import { useState } from "react";
import type { EvaluateInput } from "@/lib/acoustics/contract";
import type { BuildUpFields } from "@/lib/schemas/build-up";
import type { AttachmentSummary } from "@/lib/services/attachments";
import { uploadFile } from "@/lib/queries/build-ups";
import { ApiError } from "@/lib/queries/api";
import type { UnitPreference } from "@/lib/units";
import { FIELD_LABEL, FieldNote, SelectField, TextField } from "@/components/ui/field";
import { MeasureField } from "@/components/ui/measure-field";
import { Notice } from "@/components/ui/notice";
import { NumberField } from "@/components/ui/number-field";
import { facingOfKind } from "./facing-defaults";

export type Draft = BuildUpFields;
type Props = {
  draft: Draft;
  onChange: (d: Draft) => void;
  units: UnitPreference;
  fieldError: (field: string) => string | undefined;
  projectId: string;
  fireReport: AttachmentSummary | null;
};

const mm = (n: number) => n / 1000;

function Group({ title, children, id }: { title: string; children: React.ReactNode; id?: string }) {
  return (
    <div id={id} className="flex scroll-mt-6 flex-col gap-3 border-t border-ink/20 pt-3">
      <h3 className="text-[11px] font-semibold uppercase tracking-[0.16em] text-copper-deep">{title}</h3>
      {children}
    </div>
  );
}

export function BuildUpInputs({ draft, onChange, units, fieldError, projectId, fireReport }: Props) {
  const spec = draft.spec;
  const setSpec = (next: Partial<EvaluateInput>) => onChange({ ...draft, spec: { ...spec, ...next } as EvaluateInput });
  const setFacing = (next: Record<string, unknown>) => setSpec({ facing: { ...spec.facing, ...next } as EvaluateInput["facing"] });
  const f = spec.facing;
  const infill = spec.infill ?? null;

  return (
    <div className="flex flex-col gap-5">
      <Group title="Facing">
        <SelectField
          label="Kind"
          name="facing.kind"
          value={f.kind}
          onChange={(e) => setSpec({ facing: facingOfKind(e.target.value as EvaluateInput["facing"]["kind"], f) })}
          options={[
            { value: "round-holes", label: "Round holes" },
            { value: "slots", label: "Slots" },
            { value: "micro-perforated", label: "Micro-perforated" },
          ]}
        />
        <MeasureField label="Plate thickness" scale="fine" metres={f.thickness} units={units} onChange={(v) => setFacing({ thickness: v })} range={{ min: mm(0.2), max: mm(40), step: mm(0.1) }} error={fieldError("spec.facing.thickness")} testId="plate-thickness" />
        {f.kind === "slots" ? (
          <>
            <MeasureField label="Slot width" scale="fine" metres={f.slotWidth} units={units} onChange={(v) => setFacing({ slotWidth: v })} range={{ min: mm(0.5), max: mm(30), step: mm(0.1) }} error={fieldError("spec.facing.slotWidth")} testId="slot-width" />
            <MeasureField label="Slot pitch" scale="fine" metres={f.slotPitch} units={units} onChange={(v) => setFacing({ slotPitch: v })} range={{ min: mm(2), max: mm(200), step: mm(0.5) }} error={fieldError("spec.facing.slotPitch")} testId="slot-pitch" />
          </>
        ) : (
          <>
            <MeasureField
              label="Hole diameter"
              scale="fine"
              metres={f.holeDiameter}
              units={units}
              onChange={(v) => setFacing({ holeDiameter: v })}
              range={f.kind === "micro-perforated" ? { min: mm(0.05), max: mm(1.5), step: mm(0.01) } : { min: mm(0.5), max: mm(30), step: mm(0.1) }}
              error={fieldError("spec.facing.holeDiameter")}
              testId="hole-diameter"
            />
            <MeasureField
              label="Pitch"
              scale="fine"
              metres={f.pitch}
              units={units}
              onChange={(v) => setFacing({ pitch: v })}
              range={f.kind === "micro-perforated" ? { min: mm(0.5), max: mm(20), step: mm(0.1) } : { min: mm(2), max: mm(120), step: mm(0.5) }}
              error={fieldError("spec.facing.pitch")}
              testId="pitch"
            />
            <SelectField
              label="Grid"
              name="facing.grid"
              value={f.grid}
              onChange={(e) => setFacing({ grid: e.target.value })}
              options={[
                { value: "square", label: "Square" },
                { value: "staggered", label: "60° staggered (equilateral)" },
              ]}
            />
          </>
        )}
      </Group>

      <Group title="Cavity">
        <MeasureField label="Cavity depth" metres={spec.cavity.depth} units={units} onChange={(v) => setSpec({ cavity: { ...spec.cavity, depth: v } })} range={{ min: mm(10), max: mm(500), step: mm(1) }} error={fieldError("spec.cavity.depth")} testId="cavity-depth" />
        <label className="flex items-start gap-2 text-sm">
          <input type="checkbox" className="mt-1" checked={spec.cavity.partitioned} onChange={(e) => setSpec({ cavity: { ...spec.cavity, partitioned: e.target.checked } })} />
          <span>
            Partitioned cavity
            <span className="block text-xs text-ink-faint">Battens or honeycomb divide the air gap, so it reacts locally.</span>
          </span>
        </label>
      </Group>

      <Group title="Porous infill">
        <SelectField
          label="Infill"
          name="infill"
          value={infill ? "porous" : "none"}
          onChange={(e) =>
            setSpec({
              infill: e.target.value === "none" ? null : { thickness: Math.min(0.05, spec.cavity.depth), flowResistivity: 10000, position: "behind-facing", model: "miki" },
            })
          }
          options={[
            { value: "none", label: "None (empty cavity)" },
            { value: "porous", label: "Porous layer (mineral wool, fibre)" },
          ]}
        />
        {infill && (
          <>
            <MeasureField label="Infill thickness" metres={infill.thickness} units={units} onChange={(v) => setSpec({ infill: { ...infill, thickness: v } })} range={{ min: mm(5), max: mm(300), step: mm(1) }} error={fieldError("spec.infill.thickness")} testId="infill-thickness" />
            <NumberField
              label="Flow resistivity"
              what="flow resistivity"
              unit="Pa·s/m²"
              name="infill.flowResistivity"
              decimals={0}
              value={infill.flowResistivity}
              onChange={(v) => setSpec({ infill: { ...infill, flowResistivity: v } })}
              error={fieldError("spec.infill.flowResistivity")}
              testId="flow-resistivity"
            />
            <SelectField
              label="Position"
              name="infill.position"
              value={infill.position}
              onChange={(e) => setSpec({ infill: { ...infill, position: e.target.value as "behind-facing" | "on-backing" } })}
              options={[
                { value: "behind-facing", label: "Directly behind the facing" },
                { value: "on-backing", label: "On the backing wall" },
              ]}
            />
            <SelectField
              label="Porous model"
              name="infill.model"
              value={infill.model}
              onChange={(e) => setSpec({ infill: { ...infill, model: e.target.value as "miki" | "delany-bazley" } })}
              options={[
                { value: "miki", label: "Miki (1990)" },
                { value: "delany-bazley", label: "Delany–Bazley (1970)" },
              ]}
            />
          </>
        )}
      </Group>

      <Group title="Module">
        <div className="grid grid-cols-2 gap-3">
          <MeasureField label="Width" metres={draft.moduleWidth} units={units} onChange={(v) => onChange({ ...draft, moduleWidth: v })} error={fieldError("moduleWidth")} testId="module-width" />
          <MeasureField label="Height" metres={draft.moduleHeight} units={units} onChange={(v) => onChange({ ...draft, moduleHeight: v })} error={fieldError("moduleHeight")} testId="module-height" />
          <MeasureField label="Side border" metres={draft.borderX} units={units} onChange={(v) => onChange({ ...draft, borderX: v })} error={fieldError("borderX")} testId="border-x" />
          <MeasureField label="End border" metres={draft.borderY} units={units} onChange={(v) => onChange({ ...draft, borderY: v })} error={fieldError("borderY")} testId="border-y" />
        </div>
        <TextField label="Facing material" name="facingMaterial" value={draft.facingMaterial} onChange={(e) => onChange({ ...draft, facingMaterial: e.target.value })} error={fieldError("facingMaterial")} />
      </Group>

      <FireGroup draft={draft} onChange={onChange} fieldError={fieldError} projectId={projectId} fireReport={fireReport} />
    </div>
  );
}

function FireGroup({ draft, onChange, fieldError, projectId, fireReport }: Omit<Props, "units">) {
  const [report, setReport] = useState<AttachmentSummary | null>(fireReport);
  const [uploadError, setUploadError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  return (
    <Group title="Fire classification (declared)" id="fire">
      <SelectField
        label="Standard"
        name="fireStandard"
        value={draft.fireStandard}
        onChange={(e) => onChange({ ...draft, fireStandard: e.target.value as Draft["fireStandard"] })}
        options={[
          { value: "none", label: "Not declared" },
          { value: "EN 13501-1", label: "EN 13501-1 (reaction to fire)" },
          { value: "ASTM E84", label: "ASTM E84 (flame spread index)" },
          { value: "other", label: "Other" },
        ]}
      />
      {draft.fireStandard !== "none" && (
        <TextField label="Declared class" name="fireClass" placeholder="B-s1,d0 or Class A" value={draft.fireClass} onChange={(e) => onChange({ ...draft, fireClass: e.target.value })} error={fieldError("fireClass")} />
      )}
      <FireCaution declared={draft.fireStandard !== "none" && draft.fireClass.trim() !== ""} />
      <div className="flex flex-col gap-1">
        <label className={FIELD_LABEL} htmlFor="fire-report">
          Test report (PDF)
        </label>
        {report && (
          <a href={report.url} target="_blank" rel="noreferrer" className="text-sm text-copper-deep underline">
            {report.name}
          </a>
        )}
        <input
          id="fire-report"
          type="file"
          accept="application/pdf"
          disabled={busy}
          className="text-xs"
          onChange={async (e) => {
            const file = e.target.files?.[0];
            if (!file) return;
            setBusy(true);
            setUploadError(null);
            try {
              const uploaded = await uploadFile(projectId, "fire-report", file);
              setReport(uploaded);
              onChange({ ...draft, fireReportId: uploaded.id });
            } catch (err) {
              setUploadError(err instanceof ApiError ? (err.fieldMessage("file") ?? err.message) : "The upload failed.");
            } finally {
              setBusy(false);
            }
          }}
        />
        <FieldNote id="fire-report" error={uploadError ?? fieldError("fireReportId")} />
      </div>
    </Group>
  );
}

// Fire performance of interior finishes is a life-safety matter (SAFETY.md): said in full,
// at the point where the class is declared, not in small print at the end.
function FireCaution({ declared }: { declared: boolean }) {
  return (
    <div data-testid="fire-caution">
      <Notice tone="caution" title={declared ? "Fire: check the class against the code" : "Fire: no class declared yet"}>
        <p className="leading-relaxed">
          {declared
            ? "The class belongs to the assembly as tested and built (facing, coating, infill, cavity and substrate), from the manufacturer's test report."
            : "Submittals will flag this build-up until a class from a test report of the product as built is declared here."}{" "}
          The class required depends on the occupancy, where the finish is, sprinklers and the jurisdiction: the governing code and the authority having jurisdiction decide,
          not Cavitas.
        </p>
      </Notice>
    </div>
  );
}
