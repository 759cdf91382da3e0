import { describe, expect, it } from "vitest";
import { renderDecisionRecordPdf, type SubmittalDecision } from "@/lib/documents";
import { buildSnapshot, freezeSnapshot } from "@/lib/submittals";
import { smallRoomSource } from "../../support/submittal-rows";
import { sameBytes } from "../../support/bytes";
import { pdfPages } from "../../support/pdf-text";

const decision: SubmittalDecision = {
  outcome: "returned",
  signer: { name: "Cleo Client (fictional)", email: "client@example.test" },
  decidedAt: "2026-03-04T08:30:00Z",
  notes: "Move the top row clear of the smoke detector (pin 1).",
};
const PDF_HASH = "ab".repeat(32);

describe("the decision record", () => {
  it("is one page citing the decision, signer, time, notes and both hashes, the same bytes every time", async () => {
    const snapshot = buildSnapshot(smallRoomSource());
    const first = await renderDecisionRecordPdf({ snapshot, submittalPdfHash: PDF_HASH, decision });
    const second = await renderDecisionRecordPdf({ snapshot, submittalPdfHash: PDF_HASH, decision });
    expect(sameBytes(first, second)).toBe(true);
    const pages = await pdfPages(first);
    expect(pages).toHaveLength(1);
    const [text] = pages;
    expect(text).toContain("Practice room (fictional): submittal revision A");
    expect(text).toContain("DECISION Returned for revision");
    expect(text).toContain("SIGNED BY Cleo Client (fictional) <client@example.test>, client, by typing their full name");
    expect(text).toContain("DECIDED 4 March 2026, 08:30 UTC");
    expect(text).toContain("Move the top row clear of the smoke detector (pin 1).");
    // (letter-spaced labels can come back split, "SUBMIT TAL": match from "PDF")
    expect(text).toContain(`PDF SHA-256 ${PDF_HASH}`);
    expect(text).toContain(`SNAPSHOT SHA-256 ${freezeSnapshot(snapshot).hash}`);
  }, 120_000);
});
