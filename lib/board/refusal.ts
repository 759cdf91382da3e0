/**
 * A refused board save, read back onto the board: the server names each field by its path in
 * the document that was sent ("placements.3.width"), so the path's index finds the panel it
 * was about, by id (the list may have changed since) and by the code people read.
 */
export interface SentIssue {
  field: string;
  message: string;
}

export interface BoardIssue {
  /** the panel the issue is about; null for the board as a whole (grid module, panel count) */
  placementId: string | null;
  code: string | null;
  /** the field within the panel ("width"), or the board's own field ("gridModule") */
  field: string;
  message: string;
}

export function boardIssues(issues: readonly SentIssue[], sent: { placements: readonly { id: string; code?: string }[] }): BoardIssue[] {
  return issues.map((issue) => {
    const m = /^placements\.(\d+)\.([A-Za-z]+)/.exec(issue.field);
    const panel = m ? sent.placements[Number(m[1])] : undefined;
    if (!m || !panel) return { placementId: null, code: null, field: issue.field, message: issue.message };
    return { placementId: panel.id, code: panel.code ?? null, field: m[2], message: issue.message };
  });
}

/** The issues of one panel by field, for its fields on screen. */
export function issuesOfPanel(issues: readonly BoardIssue[], placementId: string): Record<string, string> {
  const out: Record<string, string> = {};
  for (const i of issues) if (i.placementId === placementId && !(i.field in out)) out[i.field] = i.message;
  return out;
}
