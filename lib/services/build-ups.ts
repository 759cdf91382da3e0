import { and, asc, eq } from "drizzle-orm";
import { getDb, transaction } from "@/db/client";
import { attachment, buildUp, placement, treatment, type BuildUp } from "@/db/schema";
import { runEvaluate, type EvaluateInput, type EvaluateOutput } from "@/lib/acoustics/contract";
import { conflict, notFound } from "@/lib/errors";
import { parseInput } from "@/lib/schemas/parse";
import { buildUpSchemas, type BuildUpFields } from "@/lib/schemas/build-up";
import type { Actor } from "./actor";
import { authorize } from "./guard";
import { recordAudit } from "./audit";
import { requireAttachment, summarizeAttachment, type AttachmentSummary } from "./attachments";

export type BuildUpView = Omit<BuildUpFields, "spec"> & {
  id: string;
  projectId: string;
  spec: EvaluateInput;
  version: number;
  updatedAt: string;
  fireReport: AttachmentSummary | null;
  result: EvaluateOutput;
};

function view(row: BuildUp): BuildUpView {
  const spec = JSON.parse(row.spec) as EvaluateInput;
  const report = row.fireReportId ? getDb().select().from(attachment).where(eq(attachment.id, row.fireReportId)).get() : undefined;
  return {
    id: row.id,
    projectId: row.projectId,
    name: row.name,
    spec,
    moduleWidth: row.moduleWidth,
    moduleHeight: row.moduleHeight,
    borderX: row.borderX,
    borderY: row.borderY,
    facingMaterial: row.facingMaterial,
    fireStandard: row.fireStandard,
    fireClass: row.fireClass,
    fireReportId: row.fireReportId,
    notes: row.notes,
    version: row.version,
    updatedAt: row.updatedAt.toISOString(),
    fireReport: report ? summarizeAttachment(report) : null,
    result: runEvaluate(spec),
  };
}

function load(projectId: string, buildUpId: string): BuildUp {
  const row = getDb()
    .select()
    .from(buildUp)
    .where(and(eq(buildUp.id, buildUpId), eq(buildUp.projectId, projectId)))
    .get();
  if (!row) throw notFound("Build-up");
  return row;
}

export function listBuildUps(actor: Actor | null, projectId: string): BuildUpView[] {
  authorize(actor, projectId, "design.view");
  return getDb().select().from(buildUp).where(eq(buildUp.projectId, projectId)).orderBy(asc(buildUp.name)).all().map(view);
}

export function getBuildUp(actor: Actor | null, projectId: string, buildUpId: string): BuildUpView {
  authorize(actor, projectId, "design.view");
  return view(load(projectId, buildUpId));
}

const columns = (input: BuildUpFields) => ({
  name: input.name,
  spec: JSON.stringify(input.spec),
  moduleWidth: input.moduleWidth,
  moduleHeight: input.moduleHeight,
  borderX: input.borderX,
  borderY: input.borderY,
  facingMaterial: input.facingMaterial,
  fireStandard: input.fireStandard,
  fireClass: input.fireClass,
  fireReportId: input.fireReportId,
  notes: input.notes,
});

export function createBuildUp(actor: Actor | null, projectId: string, raw: unknown): BuildUpView {
  const access = authorize(actor, projectId, "design.edit");
  const input = parseInput(buildUpSchemas(access.actor.unitPreference).create, raw);
  if (input.fireReportId !== null) requireAttachment(projectId, input.fireReportId, "fire-report", "fireReportId");
  const row = transaction((tx) => {
    const row = tx.insert(buildUp).values({ projectId, ...columns(input) }).returning().get();
    recordAudit(tx, { actorId: access.actor.userId, projectId, action: "build-up.created", subjectId: row.id, detail: { name: row.name } });
    return row;
  });
  return view(row);
}

export function updateBuildUp(actor: Actor | null, projectId: string, buildUpId: string, raw: unknown): BuildUpView {
  const access = authorize(actor, projectId, "design.edit");
  const current = load(projectId, buildUpId);
  const input = parseInput(buildUpSchemas(access.actor.unitPreference).update, raw);
  if (input.fireReportId !== null) requireAttachment(projectId, input.fireReportId, "fire-report", "fireReportId");
  const row = transaction((tx) => {
    // Only the version the editor started from may be replaced; a stale save changes nothing.
    const updated = tx
      .update(buildUp)
      .set({ ...columns(input), version: input.version + 1 })
      .where(and(eq(buildUp.id, buildUpId), eq(buildUp.version, input.version)))
      .returning()
      .get();
    if (!updated) {
      throw conflict(`"${current.name}" was changed by someone else since you opened it (now version ${current.version}). Reload it to see their changes.`, "version");
    }
    recordAudit(tx, { actorId: access.actor.userId, projectId, action: "build-up.updated", subjectId: buildUpId, detail: { version: updated.version } });
    return updated;
  });
  return view(row);
}

export function deleteBuildUp(actor: Actor | null, projectId: string, buildUpId: string): { id: string; deleted: true } {
  const access = authorize(actor, projectId, "design.edit");
  const current = load(projectId, buildUpId);
  const used = getDb().select({ id: treatment.id }).from(treatment).where(eq(treatment.buildUpId, buildUpId)).all().length;
  if (used > 0) throw conflict(`"${current.name}" is used by ${used} treated ${used === 1 ? "area" : "areas"}; remove those first.`);
  const placed = getDb().select({ id: placement.id }).from(placement).where(eq(placement.buildUpId, buildUpId)).all().length;
  if (placed > 0) throw conflict(`"${current.name}" is placed ${placed} ${placed === 1 ? "time" : "times"} on elevation boards; remove those panels first.`);
  transaction((tx) => {
    tx.delete(buildUp).where(eq(buildUp.id, buildUpId)).run();
    recordAudit(tx, { actorId: access.actor.userId, projectId, action: "build-up.deleted", subjectId: buildUpId, detail: { name: current.name } });
  });
  return { id: buildUpId, deleted: true };
}
