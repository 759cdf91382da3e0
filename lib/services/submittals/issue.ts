import { and, eq, ne, notInArray } from "drizzle-orm";
import { getDb, transaction } from "@/db/client";
import { firm, submittal, user, type Submittal } from "@/db/schema";
import { roomRows } from "@/db/queries/room-rows";
import { documentBaseName, renderSubmittalPdf } from "@/lib/documents";
import { AppError, conflict, failed, notFound } from "@/lib/errors";
import { deliver, enqueueMail } from "@/lib/mail/outbox";
import { LINKS } from "@/lib/mail/links";
import { submittalIssuedMail } from "@/lib/mail/templates";
import { parseInput } from "@/lib/schemas/parse";
import { issueSchema } from "@/lib/schemas/submittal";
import { buildSnapshot, compareRevisions, freezeSnapshot, nextRevisionLetter, readinessItems, readSnapshot, type ReadinessItem, type SubmittalSnapshot, unconfirmed } from "@/lib/submittals";
import type { Actor } from "../actor";
import { recordAudit } from "../audit";
import { authorize, type ProjectAccess } from "../guard";
import { membersIn } from "./access";
import { recordDocument, type StoredDocument, writeDocument } from "./files";

// Issuing a revision: the snapshot of the room as it stands, what it asks to be confirmed, the
// PDF rendered from the snapshot alone, and one transaction that issues it, supersedes the
// revision before it, records the document, writes the audit and queues the e-mails.

/** A room's revisions, oldest first. */
export function revisionsOf(roomId: string): Submittal[] {
  return getDb()
    .select()
    .from(submittal)
    .where(eq(submittal.roomId, roomId))
    .all()
    .sort((a, b) => compareRevisions(a.letter, b.letter));
}

type Prepared = { snapshot: SubmittalSnapshot; letter: string; roomName: string; draft: Submittal | null; previous: Submittal | null };

function prepare(access: ProjectAccess, roomId: string, issuedAt: Date | null): Prepared {
  const rows = roomRows(getDb(), access.project.id, roomId);
  if (!rows) throw notFound("Room");
  const revisions = revisionsOf(roomId);
  const draft = revisions.find((r) => r.state === "draft") ?? null;
  const previous = revisions.filter((r) => r.state !== "draft").at(-1) ?? null;
  const letter = draft?.letter ?? nextRevisionLetter(previous?.letter ?? null);
  const { actor } = access;
  const firmName = actor.firmId ? (getDb().select({ name: firm.name }).from(firm).where(eq(firm.id, actor.firmId)).get()?.name ?? null) : null;
  const snapshot = buildSnapshot({
    ...rows,
    consultant: { name: actor.name, firm: firmName, email: actor.email },
    revision: { letter, issuedAt },
    previous: previous?.snapshot && previous.snapshotSha256 ? { snapshot: readSnapshot(previous.snapshot), hash: previous.snapshotSha256 } : null,
  });
  return { snapshot, letter, roomName: rows.room.name, draft, previous };
}

export type IssueReadiness = {
  roomId: string;
  roomName: string;
  /** the letter the next issue will carry */
  letter: string;
  draft: { id: string; renderError: string | null } | null;
  previous: { id: string; letter: string; state: Submittal["state"] } | null;
  /** what issuing asks the consultant to confirm */
  items: ReadinessItem[];
  panels: number;
  scheduleRows: number;
};

export function issueReadiness(actor: Actor | null, projectId: string, roomId: string): IssueReadiness {
  const access = authorize(actor, projectId, "submittal.issue");
  const { snapshot, letter, roomName, draft, previous } = prepare(access, roomId, null);
  return {
    roomId,
    roomName,
    letter,
    draft: draft ? { id: draft.id, renderError: draft.renderError } : null,
    previous: previous ? { id: previous.id, letter: previous.letter, state: previous.state } : null,
    items: readinessItems(snapshot),
    panels: snapshot.placements.length,
    scheduleRows: snapshot.schedule.length,
  };
}

/** Another issue took this letter first (two consultants at once): one revision, not two. */
function takenMeanwhile(roomId: string, letter: string, prep: Prepared): AppError {
  const taken = revisionsOf(roomId).find((r) => r.letter === letter && r.state !== "draft");
  const by = taken?.issuedBy ? getDb().select({ name: user.name }).from(user).where(eq(user.id, taken.issuedBy)).get()?.name : null;
  const next = taken ? nextRevisionLetter(letter) : prep.letter;
  const what = taken ? `was just issued${by ? ` by ${by}` : ""}` : "is not the next revision";
  return conflict(`Revision ${letter} of ${prep.roomName} ${what}; yours was not issued. Open the submittals to see it, and issue revision ${next} if the design has changed since.`, "letter");
}

/** The draft row of this letter, made if there is none yet; two issues at once share it. */
function claimDraft(access: ProjectAccess, roomId: string, prep: Prepared): Submittal {
  const draft = transaction((tx) => {
    const existing = tx.select().from(submittal).where(and(eq(submittal.roomId, roomId), eq(submittal.state, "draft"))).get();
    return existing ?? tx.insert(submittal).values({ projectId: access.project.id, roomId, roomName: prep.roomName, letter: prep.letter, createdBy: access.actor.userId }).returning().get();
  });
  if (draft.letter !== prep.letter) throw conflict(`Revision ${draft.letter} of ${prep.roomName} changed while you issued; look at the submittals again.`, "roomId");
  return draft;
}

async function renderOrKeepDraft(access: ProjectAccess, draft: Submittal, snapshot: SubmittalSnapshot): Promise<StoredDocument> {
  const units = access.actor.unitPreference;
  try {
    const bytes = await renderSubmittalPdf(snapshot, { units });
    return writeDocument({ kind: "submittal", units, name: `${documentBaseName(snapshot)}_submittal.pdf`, bytes });
  } catch (e) {
    const reason = e instanceof Error ? e.message : String(e);
    console.error(e);
    transaction((tx) => {
      tx.update(submittal).set({ renderError: reason }).where(and(eq(submittal.id, draft.id), eq(submittal.state, "draft"))).run();
      recordAudit(tx, { actorId: access.actor.userId, projectId: access.project.id, action: "submittal.render-failed", subjectId: draft.id, detail: { letter: draft.letter, reason } });
    });
    throw failed(`The submittal PDF of revision ${draft.letter} could not be made (${reason}). Revision ${draft.letter} stays a draft: nothing was issued and no one was told. Try again; if it fails again, send us this message.`);
  }
}

export async function issueSubmittal(actor: Actor | null, projectId: string, raw: unknown): Promise<{ id: string; letter: string }> {
  const access = authorize(actor, projectId, "submittal.issue");
  const input = parseInput(issueSchema, raw);
  const issuedAt = new Date();
  const prep = prepare(access, input.roomId, issuedAt);
  if (prep.letter !== input.letter) throw takenMeanwhile(input.roomId, input.letter, prep);
  const items = readinessItems(prep.snapshot);
  const missing = unconfirmed(items, input.confirm);
  if (missing.length) {
    const n = missing.length;
    throw new AppError(
      "conflict",
      `Revision ${prep.letter} was not issued: confirm ${n === 1 ? "this item" : `these ${n} items`} first, or fix ${n === 1 ? "it" : "them"} on the boards.`,
      missing.map((i) => ({ field: "confirm", message: i.message })),
    );
  }
  const draft = claimDraft(access, input.roomId, prep);
  const document = await renderOrKeepDraft(access, draft, prep.snapshot);
  const frozen = freezeSnapshot(prep.snapshot);
  const { actor: who, project } = access;
  const mails = transaction((tx) => {
    // Only a draft becomes issued: when two consultants issue at once, the second finds it gone.
    const issued = tx
      .update(submittal)
      .set({ state: "issued", snapshot: frozen.json, snapshotSha256: frozen.hash, issuedAt, issuedBy: who.userId, confirmed: JSON.stringify(items), renderError: null, roomName: prep.roomName })
      .where(and(eq(submittal.id, draft.id), eq(submittal.state, "draft")))
      .returning()
      .get();
    if (!issued) throw takenMeanwhile(input.roomId, draft.letter, prep);
    const superseded = tx
      .update(submittal)
      .set({ state: "superseded", supersededAt: issuedAt, supersededBy: issued.id })
      .where(and(eq(submittal.roomId, input.roomId), ne(submittal.id, issued.id), notInArray(submittal.state, ["draft", "superseded"])))
      .returning()
      .all();
    for (const old of superseded) {
      recordAudit(tx, { actorId: who.userId, projectId: project.id, action: "submittal.superseded", subjectId: old.id, detail: { letter: old.letter, by: issued.letter } });
    }
    recordDocument(tx, issued.id, document);
    recordAudit(tx, {
      actorId: who.userId,
      projectId: project.id,
      action: "submittal.issued",
      subjectId: issued.id,
      detail: { letter: issued.letter, room: prep.roomName, snapshotSha256: frozen.hash, pdfSha256: document.sha256, confirmed: items.map((i) => i.key), supersedes: superseded.map((s) => s.letter) },
    });
    const supersedes = superseded.map((s) => s.letter).join(", ") || null;
    return membersIn(tx, project.id, ["architect", "client"]).map((m) =>
      enqueueMail(tx, {
        to: m.email,
        projectId: project.id,
        ...submittalIssuedMail({ projectName: project.name, roomName: prep.roomName, letter: issued.letter, consultantName: who.name, role: m.role, pdfSha256: document.sha256, supersedes, link: LINKS.submittal(project.id, issued.id) }),
      }),
    );
  });
  await deliver(mails);
  return { id: draft.id, letter: draft.letter };
}
