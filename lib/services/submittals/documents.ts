import { transaction } from "@/db/client";
import type { SubmittalDocument } from "@/db/schema";
import { conflict, invalid, notFound } from "@/lib/errors";
import type { Actor } from "../actor";
import { recordAudit } from "../audit";
import { openRevision, requireInForce, revisionName } from "./access";
import { documentBytes, findDocument } from "./files";

// The stored documents of a revision, byte for byte as they were made: a re-download after the
// design has moved on is still the file that was issued, decided on or approved.

export type DocumentDownload = { doc: SubmittalDocument; bytes: Buffer };

export function readSubmittalPdf(actor: Actor | null, projectId: string, submittalId: string): DocumentDownload {
  const { row } = openRevision(actor, projectId, submittalId);
  const doc = findDocument(row.id, "submittal");
  if (!doc) throw conflict(`${revisionName(row)} is a draft and has no PDF yet.`, "state");
  return { doc, bytes: documentBytes(doc) };
}

export function readDecisionRecord(actor: Actor | null, projectId: string, submittalId: string): DocumentDownload {
  const { row } = openRevision(actor, projectId, submittalId);
  const doc = findDocument(row.id, "decision-record");
  if (!doc) throw notFound(`A decision record of ${revisionName(row).charAt(0).toLowerCase()}${revisionName(row).slice(1)}`);
  return { doc, bytes: documentBytes(doc) };
}

/** The shop pack in the reader's units, for an approved revision in force; each download is audited with its hash. */
export function readShopPack(actor: Actor | null, projectId: string, submittalId: string, units: string | null = null): DocumentDownload {
  const access = openRevision(actor, projectId, submittalId, "shop.download");
  const { row } = access;
  if (units !== null && units !== "metric" && units !== "imperial") throw invalid([{ field: "units", message: "Ask for the shop pack in metric or imperial units." }]);
  requireInForce(row, "a shop pack is made only from");
  const doc = findDocument(row.id, "shop-pack", units ?? access.actor.unitPreference);
  if (!doc) throw notFound("The shop pack");
  transaction((tx) =>
    recordAudit(tx, { actorId: access.actor.userId, projectId, action: "shop-pack.downloaded", subjectId: row.id, detail: { letter: row.letter, name: doc.name, units: doc.units, sha256: doc.sha256 } }),
  );
  return { doc, bytes: documentBytes(doc) };
}
