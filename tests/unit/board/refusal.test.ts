import { describe, expect, it } from "vitest";
import { boardIssues, issuesOfPanel } from "@/lib/board/refusal";

describe("a refused board save read back onto the panels", () => {
  const sent = { placements: [{ id: "a", code: "P-001" }, { id: "b", code: "P-002" }] };
  it("finds the panel and field each issue names, by the index in what was sent", () => {
    const issues = boardIssues(
      [
        { field: "placements.1.width", message: "A panel must be at least 20 mm wide." },
        { field: "gridModule", message: "The grid module must be between 10 mm and 5 m." },
        { field: "placements.7.x", message: "beyond the list" },
      ],
      sent,
    );
    expect(issues).toEqual([
      { placementId: "b", code: "P-002", field: "width", message: "A panel must be at least 20 mm wide." },
      { placementId: null, code: null, field: "gridModule", message: "The grid module must be between 10 mm and 5 m." },
      { placementId: null, code: null, field: "placements.7.x", message: "beyond the list" },
    ]);
    expect(issuesOfPanel(issues, "b")).toEqual({ width: "A panel must be at least 20 mm wide." });
    expect(issuesOfPanel(issues, "a")).toEqual({});
  });
});
