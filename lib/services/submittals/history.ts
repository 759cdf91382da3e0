import { asc, eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { auditEvent, type Submittal } from "@/db/schema";

// A revision's history in plain words, from the audit events written with each transition.

export type HistoryLine = { at: string; who: string | null; what: string };

type Detail = Record<string, unknown>;

/** "P-001 on Wall A (length)": codes repeat from one board to the next. */
const panelName = (d: Detail) => (d.surface ? `${String(d.code)} on ${String(d.surface)}` : String(d.code));

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
    case "installation.unmarked":
      return `${panelName(d)} marked not installed.`;
    case "installation.photo":
      return `Site photo added to ${panelName(d)}.`;
    default:
      return null;
  }
}

const MARKS_NAMED = 12;

/** Panels marked installed one after another by one person read as one line. */
function groupMarks(events: { at: string; who: string | null; action: string; detail: Detail }[]): HistoryLine[] {
  const lines: (HistoryLine & { codes?: string[] })[] = [];
  for (const e of events) {
    const last = lines.at(-1);
    if (e.action === "installation.marked") {
      if (last?.codes && last.who === e.who) {
        last.codes.push(panelName(e.detail));
        last.at = e.at;
      } else lines.push({ at: e.at, who: e.who, what: "", codes: [panelName(e.detail)] });
      continue;
    }
    const what = words(e.action, e.detail);
    if (what) lines.push({ at: e.at, who: e.who, what });
  }
  return lines.map(({ codes, ...line }) => {
    if (!codes) return line;
    const more = codes.length > MARKS_NAMED ? ` and ${codes.length - MARKS_NAMED} more` : "";
    return { ...line, what: `${codes.slice(0, MARKS_NAMED).join(", ")}${more} marked installed.` };
  });
}

export function historyOf(row: Submittal, people: Map<string, string>): HistoryLine[] {
  const events = getDb()
    .select()
    .from(auditEvent)
    .where(eq(auditEvent.subjectId, row.id))
    .orderBy(asc(auditEvent.createdAt))
    .all()
    .map((e) => ({ at: e.createdAt.toISOString(), who: e.actorId ? (people.get(e.actorId) ?? "A former member") : null, action: e.action, detail: e.detail ? (JSON.parse(e.detail) as Detail) : {} }));
  return groupMarks(events);
}
