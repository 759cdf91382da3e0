import { describe, expect, it } from "vitest";
import { compareFireClass, type FireClass, fireFinding, parseFireClass } from "@/lib/fire";

const c = (text: string): FireClass => {
  const r = parseFireClass(text);
  if (!r.ok) throw new Error(r.message);
  return r.value;
};

// The rule under test: a declared class meets a required one when the main class, the smoke
// class and the droplet class are each at least as good (common practice for EN 13501-1
// classes); orders A1 > A2 > B > C > D > E > F, s1 > s2 > s3, d0 > d1 > d2 (EN 13501-1, as
// summarised by test houses); North American Class A > B > C (IBC §803.1.2, NFPA 101 §10.2.3.4).
describe("European: each part at least as good", () => {
  it.each([
    ["B-s1,d0", "B-s1,d0"],
    ["A2-s1,d0", "B-s1,d0"],
    ["A1", "A2-s1,d0"],
    ["B-s1,d0", "C-s2,d1"],
    ["B-s3,d2", "B"],
    ["E", "E-d2"],
    ["Bfl-s1", "Cfl-s2"],
  ])("%s meets %s", (declared, required) => {
    expect(compareFireClass(c(declared), c(required))).toEqual({ status: "meets" });
  });

  it.each([
    ["C-s1,d0", "B-s1,d0", [{ part: "class", declared: "C", required: "B" }]],
    ["B-s2,d0", "B-s1,d0", [{ part: "smoke", declared: "s2", required: "s1" }]],
    ["B-s1,d1", "B-s1,d0", [{ part: "droplets", declared: "d1", required: "d0" }]],
    [
      "D-s3,d2",
      "B-s1,d0",
      [
        { part: "class", declared: "D", required: "B" },
        { part: "smoke", declared: "s3", required: "s1" },
        { part: "droplets", declared: "d2", required: "d0" },
      ],
    ],
    ["B", "B-s2,d1", [{ part: "smoke", declared: null, required: "s2" }, { part: "droplets", declared: null, required: "d1" }]],
    ["E-d2", "E", [{ part: "droplets", declared: "d2", required: "no droplets (E)" }]],
  ])("%s is lower than %s, and says which part", (declared, required, shortfalls) => {
    expect(compareFireClass(c(declared), c(required))).toEqual({ status: "lower", shortfalls });
  });

  it("a flooring class is not compared with a wall or ceiling class", () => {
    expect(compareFireClass(c("Bfl-s1"), c("B-s1,d0"))).toEqual({ status: "not-comparable", reason: "flooring" });
  });
});

describe("North American: Class A > B > C", () => {
  it.each([
    ["Class A", "Class A", "meets"],
    ["Class A", "Class C", "meets"],
    ["FSI 20, SDI 150", "Class A", "meets"],
    ["Class B", "Class A", "lower"],
    ["FSI 90, SDI 100", "Class B", "lower"],
  ])("%s against %s: %s", (declared, required, status) => {
    expect(compareFireClass(c(declared), c(required)).status).toBe(status);
  });

  it("indices that miss every class on smoke fail on smoke", () => {
    expect(compareFireClass(c("FSI 10, SDI 500 (no class)"), c("Class C"))).toEqual({
      status: "lower",
      shortfalls: [{ part: "smoke", declared: "SDI 500", required: "SDI at most 450" }],
    });
  });
});

describe("across systems", () => {
  it("is never comparable", () => {
    expect(compareFireClass(c("Class A"), c("B-s1,d0"))).toEqual({ status: "not-comparable", reason: "systems" });
    expect(compareFireClass(c("A1"), c("Class A"))).toEqual({ status: "not-comparable", reason: "systems" });
  });
});

describe("fireFinding: what the documents say", () => {
  it("meets", () => {
    const f = fireFinding({ standard: "EN 13501-1", declared: "A2-s1, d0", required: "B-s1,d0" });
    expect(f).toMatchObject({ status: "meets", flagged: false, declared: "A2-s1,d0", required: "B-s1,d0" });
  });

  it("lower, naming the part", () => {
    const f = fireFinding({ standard: "EN 13501-1", declared: "B-s2,d0", required: "B-s1,d0" });
    expect(f.status).toBe("lower");
    expect(f.flagged).toBe(true);
    expect(f.message).toBe("Declared B-s2,d0 is lower than the required B-s1,d0: smoke class s2 against s1.");
  });

  it("missing when nothing is declared", () => {
    expect(fireFinding({ standard: "none", declared: "", required: "Class A" })).toMatchObject({ status: "missing", flagged: true, required: "Class A" });
    expect(fireFinding({ standard: "EN 13501-1", declared: "  ", required: null })).toMatchObject({ status: "missing", flagged: true });
  });

  it("not comparable across systems", () => {
    const f = fireFinding({ standard: "ASTM E84", declared: "A", required: "B-s1,d0" });
    expect(f).toMatchObject({ status: "not-comparable", declared: "Class A", flagged: true });
    expect(f.message).toMatch(/different systems/);
  });

  it("unreadable classes and a class of the wrong standard are flagged, not guessed", () => {
    expect(fireFinding({ standard: "EN 13501-1", declared: "B-s9", required: "B-s1,d0" })).toMatchObject({ status: "unreadable", flagged: true });
    expect(fireFinding({ standard: "EN 13501-1", declared: "Class A", required: "Class A" })).toMatchObject({ status: "unreadable", flagged: true });
    expect(fireFinding({ standard: "EN 13501-1", declared: "B-s1,d0", required: "bogus" }).message).toMatch(/required class cannot be read/);
  });

  it("no requirement yet is said, not flagged", () => {
    expect(fireFinding({ standard: "EN 13501-1", declared: "B-s1,d0", required: null })).toMatchObject({ status: "no-requirement", flagged: false });
  });
});
