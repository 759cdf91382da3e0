import { asc, eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { auditEvent, type Submittal } from "@/db/schema";

// A revision's history in plain words, from the audit events written with each transition.

export type HistoryLine = { at: string; who: string | null; what: string };

type Detail = Record<string, unknown>;

const OUTCOMES: Record<string, string> = { approved: "Approved", "approved-as-noted": "Approved as noted", returned: "Returned for revision" };

function words(action: string, d: Detail): string | null {
  switch (action) {
    case "submittal.render-failed":
      return `An attempt to issue failed; it stayed a draft (${String(d.reason ?? "no reason given")}).`;
    case "submittal.issued": {
      const confirmed = Array.isArray(d.confirmed) ? d.confirmed.length : 0;
      const supersedes = Array.isArray(d.supersedes) && d.supersedes.length ? ` It superseded revision ${d.supersedes.join(", ")}.` : "";
      return `Issued. PDF SHA-256 ${String(d.pdfSha256)}.${confirmed ? ` ${confirmed} ${confirmed === 1 ? "item was" : "items were"} confirmed at issue.` : ""}${supersedes}`;
    }
    case "submittal.superseded":
      return `Superseded by revision ${String(d.by)}.`;
    case "submittal.decided":
      return `${OUTCOMES[String(d.outcome)] ?? "Decided"}, signed "${String(d.signature)}", on the PDF with SHA-256 ${String(d.pdfSha256)}.`;
    case "shop-pack.downloaded":
      return `Shop pack downloaded (${String(d.units)}), SHA-256 ${String(d.sha256)}.`;
    case "installation.marked":
      return `${String(d.code)} marked installed.`;
    case "installation.unmarked":
      return `${String(d.code)} marked not installed.`;
    case "installation.photo":
      return `Site photo added to ${String(d.code)}.`;
    default:
      return null;
  }
}

export function historyOf(row: Submittal, people: Map<string, string>): HistoryLine[] {
  return getDb()
    .select()
    .from(auditEvent)
    .where(eq(auditEvent.subjectId, row.id))
    .orderBy(asc(auditEvent.createdAt))
    .all()
    .flatMap((e) => {
      const what = words(e.action, e.detail ? (JSON.parse(e.detail) as Detail) : {});
      return what ? [{ at: e.createdAt.toISOString(), who: e.actorId ? (people.get(e.actorId) ?? "A former member") : null, what }] : [];
    });
}
