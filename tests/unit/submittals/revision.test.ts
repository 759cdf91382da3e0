import { describe, expect, it } from "vitest";
import { compareRevisions, nextRevisionLetter, revisionIndex, revisionLetter } from "@/lib/submittals";

describe("revision letters", () => {
  it.each([
    [0, "A"],
    [1, "B"],
    [25, "Z"],
    [26, "AA"],
    [27, "AB"],
    [51, "AZ"],
    [52, "BA"],
    // 26 one-letter + 26² two-letter revisions come before the first three-letter one.
    [26 + 26 * 26 - 1, "ZZ"],
    [26 + 26 * 26, "AAA"],
  ])("revision %d is %s", (index, letter) => {
    expect(revisionLetter(index)).toBe(letter);
    expect(revisionIndex(letter)).toBe(index);
  });

  it("every letter reads back to its index, and no two indices share a letter", () => {
    const seen = new Set<string>();
    for (let i = 0; i < 20_000; i++) {
      const letter = revisionLetter(i);
      expect(revisionIndex(letter)).toBe(i);
      seen.add(letter);
    }
    expect(seen.size).toBe(20_000);
  });

  it("counts on from the previous letter", () => {
    expect(nextRevisionLetter(null)).toBe("A");
    expect(nextRevisionLetter("A")).toBe("B");
    expect(nextRevisionLetter("Z")).toBe("AA");
    expect(nextRevisionLetter("AZ")).toBe("BA");
  });

  it("orders letters as they were issued", () => {
    expect(["AA", "C", "B", "Z", "A"].sort(compareRevisions)).toEqual(["A", "B", "C", "Z", "AA"]);
  });

  it("refuses what is not a letter", () => {
    expect(revisionIndex("a")).toBeNull();
    expect(revisionIndex("")).toBeNull();
    expect(revisionIndex("B2")).toBeNull();
    expect(() => nextRevisionLetter("b")).toThrow('"b" is not a revision letter');
    expect(() => revisionLetter(-1)).toThrow(RangeError);
    expect(() => revisionLetter(1.5)).toThrow(RangeError);
  });
});
