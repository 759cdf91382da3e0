/** The client's decision on an issued revision, as the decision record and the shop pack cite it. */
export const DECISION_OUTCOMES = ["approved", "approved-as-noted", "returned"] as const;
export type DecisionOutcome = (typeof DECISION_OUTCOMES)[number];

export interface SubmittalDecision {
  outcome: DecisionOutcome;
  /** the full name the signer typed, and their address */
  signer: { name: string; email?: string | null };
  /** ISO 8601 */
  decidedAt: string;
  notes: string;
}

export const OUTCOME_WORDS: Record<DecisionOutcome, string> = {
  approved: "Approved",
  "approved-as-noted": "Approved as noted",
  returned: "Returned for revision",
};

/** A shop pack is made only from a revision the client approved (as noted or not). */
export function requireApproval(decision: SubmittalDecision): void {
  if (decision.outcome === "returned") throw new Error("A shop pack is made only for an approved revision; this one was returned for revision.");
}
