import { and, eq, inArray } from "drizzle-orm";
import { transaction, type Tx } from "@/db/client";
import { installation, submittal, type Submittal } from "@/db/schema";
import { buildShopPack, documentBaseName, renderDecisionRecordPdf, type SubmittalDecision } from "@/lib/documents";
import { conflict, failed, forbidden, invalid } from "@/lib/errors";
import { deliver, enqueueMail } from "@/lib/mail/outbox";
import { LINKS } from "@/lib/mail/links";
import { shopPackReadyMail, submittalDecidedMail } from "@/lib/mail/templates";
import { parseInput } from "@/lib/schemas/parse";
import { decisionSchema, type DecisionInput } from "@/lib/schemas/submittal";
import { readSnapshot, type SubmittalSnapshot } from "@/lib/submittals";
import type { UnitPreference } from "@/lib/units";
import type { Actor } from "../actor";
import { recordAudit } from "../audit";
import { authorize } from "../guard";
import { letterOf, loadRevision, membersIn, revisionName, STATE_WORDS } from "./access";
import { findDocument, recordDocument, type StoredDocument, writeDocument } from "./files";
import { revisionsOf } from "./issue";

// The client's decision on an issued revision: approved, approved as noted, or returned with
// notes, signed by typing their full name. The decision record (and, for an approval, the shop
// pack in both unit systems) is rendered first; one transaction then records the decision only
// if the revision is still issued, stores the documents, audits and queues the e-mails.

/** A name as a signature is compared: case, spacing, punctuation and a bracketed remark aside. */
export const signatureForm = (name: string) =>
  name
    .replace(/\([^)]*\)/g, " ")
    .normalize("NFKC")
    .toLowerCase()
    .replace(/[^\p{L}\p{N}]+/gu, " ")
    .trim();

/** The name a signer is asked to type: the account's name without a bracketed remark. */
export const nameToSign = (name: string) => name.replace(/\s*\([^)]*\)\s*/g, " ").trim() || name;

function refuseUndecidable(row: Submittal, actor: Actor): void {
  const name = revisionName(row);
  if (row.state === "draft") throw conflict(`${name} is a draft; only an issued revision can be approved or returned.`, "state");
  if (row.state === "superseded") {
    const by = row.supersededBy ? letterOf(row.supersededBy) : null;
    throw conflict(`${name} was superseded${by ? ` by revision ${by}` : ""}; decide on the revision in force instead.`, "state");
  }
  if (row.state !== "issued") throw conflict(`${name} is already ${STATE_WORDS[row.state]}${row.decidedAt ? ` (${row.decidedAt.toISOString().slice(0, 10)})` : ""}; a decision is final.`, "state");
  if (row.issuedBy === actor.userId) throw forbidden(`You issued ${name.charAt(0).toLowerCase()}${name.slice(1)}; someone else must decide on it.`);
}

function checkSignature(input: DecisionInput, actor: Actor, pdfSha256: string): void {
  if (signatureForm(input.signature) !== signatureForm(actor.name)) {
    throw invalid([{ field: "signature", message: `Type your full name as your account has it ("${nameToSign(actor.name)}") to sign.` }]);
  }
  if (input.pdfSha256 !== pdfSha256) {
    throw conflict("The PDF you read is not the one issued (its SHA-256 differs). Open the issued PDF again and decide on it.", "pdfSha256");
  }
}

async function renderDecision(snapshot: SubmittalSnapshot, pdfSha256: string, decision: SubmittalDecision, units: UnitPreference): Promise<StoredDocument[]> {
  const base = documentBaseName(snapshot);
  try {
    const record = await renderDecisionRecordPdf({ snapshot, submittalPdfHash: pdfSha256, decision });
    const docs = [writeDocument({ kind: "decision-record", units, name: `${base}_decision-record.pdf`, bytes: record })];
    if (decision.outcome !== "returned") {
      for (const u of ["metric", "imperial"] as const) {
        const pack = await buildShopPack({ snapshot, submittalPdfHash: pdfSha256, approval: decision, units: u });
        docs.push(writeDocument({ kind: "shop-pack", units: u, name: pack.name.replace(/\.zip$/, `_${u}.zip`), bytes: pack.zip }));
      }
    }
    return docs;
  } catch (e) {
    console.error(e);
    const reason = e instanceof Error ? e.message : String(e);
    throw failed(`The decision's documents could not be made (${reason}). Nothing was recorded: the revision is still awaiting your decision. Try again.`);
  }
}

/**
 * Panels already marked installed on the approved revision this one replaces carry over where
 * the new revision places the same panel (same id and code, surface, position, size and build-up).
 */
function carryInstallations(tx: Tx, row: Submittal, snapshot: SubmittalSnapshot): number {
  if (!row.roomId) return 0;
  const earlier = revisionsOf(row.roomId)
    .filter((r) => r.id !== row.id && (r.outcome === "approved" || r.outcome === "approved-as-noted") && r.snapshot)
    .at(-1);
  if (!earlier?.snapshot) return 0;
  const before = new Map(readSnapshot(earlier.snapshot).placements.map((p) => [p.id, p]));
  const same = snapshot.placements.filter((p) => {
    const b = before.get(p.id);
    return b && b.code === p.code && b.surfaceKey === p.surfaceKey && b.buildUpId === p.buildUpId && b.x === p.x && b.y === p.y && b.width === p.width && b.height === p.height;
  });
  if (same.length === 0) return 0;
  const done = tx
    .select()
    .from(installation)
    .where(and(eq(installation.submittalId, earlier.id), inArray(installation.placementId, same.map((p) => p.id))))
    .all();
  for (const d of done) {
    tx.insert(installation).values({ projectId: row.projectId, submittalId: row.id, placementId: d.placementId, code: d.code, installedAt: d.installedAt, installedBy: d.installedBy, photoId: d.photoId }).run();
  }
  return done.length;
}

export async function decideSubmittal(actor: Actor | null, projectId: string, submittalId: string, raw: unknown): Promise<{ id: string; state: Submittal["state"] }> {
  const access = authorize(actor, projectId, "submittal.decide");
  const row = loadRevision(projectId, submittalId);
  refuseUndecidable(row, access.actor);
  const input = parseInput(decisionSchema, raw);
  const pdf = findDocument(row.id, "submittal");
  if (!pdf || !row.snapshot) throw conflict(`${revisionName(row)} has no issued PDF to decide on.`, "state");
  checkSignature(input, access.actor, pdf.sha256);
  const snapshot = readSnapshot(row.snapshot);
  const decidedAt = new Date();
  const decision: SubmittalDecision = { outcome: input.outcome, signer: { name: input.signature, email: access.actor.email }, decidedAt: decidedAt.toISOString(), notes: input.notes };
  const documents = await renderDecision(snapshot, pdf.sha256, decision, access.actor.unitPreference);
  const { actor: who, project } = access;
  const ref = { projectName: project.name, roomName: row.roomName, letter: row.letter };
  const mails = transaction((tx) => {
    const decided = tx
      .update(submittal)
      .set({ state: input.outcome, outcome: input.outcome, decidedAt, decidedBy: who.userId, signature: input.signature, notes: input.notes, decidedPdfSha256: pdf.sha256 })
      .where(and(eq(submittal.id, row.id), eq(submittal.state, "issued")))
      .returning()
      .get();
    if (!decided) throw conflict(`${revisionName(row)} was decided or superseded a moment ago; yours was not recorded. Open it again to see its state.`, "state");
    for (const d of documents) recordDocument(tx, row.id, d);
    const carried = input.outcome === "returned" ? 0 : carryInstallations(tx, decided, snapshot);
    recordAudit(tx, {
      actorId: who.userId,
      projectId: project.id,
      action: "submittal.decided",
      subjectId: row.id,
      detail: { letter: row.letter, outcome: input.outcome, signature: input.signature, pdfSha256: pdf.sha256, documents: documents.map((d) => ({ kind: d.kind, units: d.units, sha256: d.sha256 })), carriedInstallations: carried },
    });
    const link = LINKS.submittal(project.id, row.id);
    const ids = membersIn(tx, project.id, ["consultant"]).map((m) =>
      enqueueMail(tx, { to: m.email, projectId: project.id, ...submittalDecidedMail({ ...ref, outcome: input.outcome, signerName: input.signature, notes: input.notes, link }) }),
    );
    if (input.outcome !== "returned") {
      for (const m of membersIn(tx, project.id, ["installer"])) {
        const pack = documents.find((d) => d.kind === "shop-pack" && d.units === m.units)!;
        ids.push(
          enqueueMail(tx, {
            to: m.email,
            projectId: project.id,
            ...shopPackReadyMail({ ...ref, outcome: input.outcome, notes: input.notes, packName: pack.name, packSha256: pack.sha256, link: LINKS.shopPack(project.id, row.id) }),
          }),
        );
      }
    }
    return ids;
  });
  await deliver(mails);
  return { id: row.id, state: input.outcome };
}
