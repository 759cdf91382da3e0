import { describe, expect, it } from "vitest";
import { requiredFireClass, roomFire } from "@/lib/fire";
import { requiredFireClassField } from "@/lib/schemas/fire";

// Which class a room requires: its own, else the project's (the consultant's entry, SPEC §9).
describe("the class a room requires", () => {
  it("is the room's own when entered, else the project's, else none", () => {
    expect(requiredFireClass({ project: "B-s1,d0", room: "A2-s1,d0" })).toEqual({ required: "A2-s1,d0", from: "room" });
    expect(requiredFireClass({ project: "B-s1,d0", room: "  " })).toEqual({ required: "B-s1,d0", from: "project" });
    expect(requiredFireClass({ project: null, room: null })).toEqual({ required: null, from: null });
  });

  it("judges each build-up the room uses against it and counts the flags", () => {
    const fire = roomFire({ project: "B-s1,d0", room: null }, [
      { id: "a", name: "Raft", fireStandard: "EN 13501-1", fireClass: "A2-s1,d0" },
      { id: "b", name: "Bass", fireStandard: "EN 13501-1", fireClass: "B-s2,d0" },
      { id: "c", name: "Slots", fireStandard: "none", fireClass: "" },
      { id: "d", name: "Import", fireStandard: "ASTM E84", fireClass: "Class A" },
    ]);
    // A2 is better than B in the main class (EN 13501-1 orders them A1 … F); s2 is worse
    // smoke than s1; a North American class cannot be read in the European system.
    expect(fire.findings.map((f) => f.finding.status)).toEqual(["meets", "lower", "missing", "not-comparable"]);
    expect(fire.flagged).toBe(3);
    expect(fire.from).toBe("project");
  });
});

describe("the required class field", () => {
  it("stores a class as Cavitas prints it, so what is shown can be typed back", () => {
    expect(requiredFireClassField.parse("b - s1, d0")).toBe("B-s1,d0");
    expect(requiredFireClassField.parse("class ii")).toBe("Class B");
    expect(requiredFireClassField.parse(requiredFireClassField.parse("FSI 20, SDI 150"))).toBe("Class A (FSI 20, SDI 150)");
    expect(requiredFireClassField.parse("")).toBeNull();
    expect(requiredFireClassField.parse(null)).toBeNull();
  });

  it("refuses what is not a class, with a message that says what to write", () => {
    const r = requiredFireClassField.safeParse("G-s9");
    expect(r.success).toBe(false);
    expect(r.error?.issues[0].message).toMatch(/not a class Cavitas can read.*B-s1,d0/);
  });
});
