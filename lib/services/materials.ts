import { asc, eq } from "drizzle-orm";
import { getDb, transaction } from "@/db/client";
import { projectMaterial, type ProjectMaterial } from "@/db/schema";
import { MATERIALS, materialAlphaSchema, type Material } from "@/lib/rooms/materials-library";
import type { OctaveRecord } from "@/lib/rooms/octaves";
import { parseInput } from "@/lib/schemas/parse";
import { nameField } from "@/lib/schemas/common";
import { z } from "zod";
import type { Actor } from "./actor";
import { authorize } from "./guard";
import { recordAudit } from "./audit";
import { requireAttachment, summarizeAttachment, type AttachmentSummary } from "./attachments";
import { attachment } from "@/db/schema";

// Finishes: the built-in library (in code) and each project's own materials (in the database,
// keyed "project:<id>"), resolved through one lookup so the check treats both alike.
export const PROJECT_KEY_PREFIX = "project:";

export type MaterialView = Omit<Material, "provenance"> & { provenance: string; report: AttachmentSummary | null; own: boolean };

function ownView(m: ProjectMaterial): MaterialView {
  const report = m.reportId ? getDb().select().from(attachment).where(eq(attachment.id, m.reportId)).get() : undefined;
  return {
    key: `${PROJECT_KEY_PREFIX}${m.id}`,
    name: m.name,
    category: m.category as Material["category"],
    alpha: JSON.parse(m.alpha) as OctaveRecord,
    source: m.source,
    short: m.source,
    citation: null,
    provenance: report ? "from a test report" : "entered by the consultant",
    report: report ? summarizeAttachment(report) : null,
    own: true,
  };
}

export function projectMaterials(projectId: string): MaterialView[] {
  return getDb().select().from(projectMaterial).where(eq(projectMaterial.projectId, projectId)).orderBy(asc(projectMaterial.name)).all().map(ownView);
}

export function materialLookup(projectId: string): (key: string) => OctaveRecord | undefined {
  const own = new Map(projectMaterials(projectId).map((m) => [m.key, m.alpha]));
  const library = new Map(MATERIALS.map((m) => [m.key, m.alpha]));
  return (key) => own.get(key) ?? library.get(key);
}

export function listMaterials(actor: Actor | null, projectId: string): MaterialView[] {
  authorize(actor, projectId, "design.view");
  return [...projectMaterials(projectId), ...MATERIALS.map((m) => ({ ...m, report: null, own: false }))];
}

export const createMaterialSchema = z.object({
  name: nameField,
  category: z.enum(["wall", "floor", "ceiling", "opening", "furnishing", "any"], { error: "Choose where the material is used." }).default("any"),
  alpha: materialAlphaSchema,
  source: z.string().trim().min(3, { error: "Say where the values come from, e.g. the test report's number and laboratory." }).max(400),
  reportId: z.string().max(64).nullable().default(null),
});

export function createProjectMaterial(actor: Actor | null, projectId: string, raw: unknown): MaterialView {
  const access = authorize(actor, projectId, "design.edit");
  const input = parseInput(createMaterialSchema, raw);
  if (input.reportId !== null) requireAttachment(projectId, input.reportId, "test-report", "reportId");
  const row = transaction((tx) => {
    const row = tx
      .insert(projectMaterial)
      .values({ projectId, name: input.name, category: input.category, alpha: JSON.stringify(input.alpha), source: input.source, reportId: input.reportId })
      .returning()
      .get();
    recordAudit(tx, { actorId: access.actor.userId, projectId, action: "material.created", subjectId: row.id, detail: { name: row.name } });
    return row;
  });
  return ownView(row);
}
