import { describe, expect, it } from "vitest";
import { classFromIndices, EN_MAIN, type EnFireClass, type FireClass, formatFireClass, parseFireClass } from "@/lib/fire";

const read = (text: string, standard?: Parameters<typeof parseFireClass>[1]): FireClass => {
  const r = parseFireClass(text, standard);
  if (!r.ok) throw new Error(r.message);
  return r.value;
};

// Every European class EN 13501-1 allows, by the rules the module states (A1 and F plain; E
// plain or E-d2; floorings with s1 or s2 only; A2–D with any smoke and droplet class, or parts
// left unstated), so the round trip covers the whole range.
function allEuropean(): EnFireClass[] {
  const out: EnFireClass[] = [];
  const smokes = [null, 1, 2, 3] as const;
  const drops = [null, 0, 1, 2] as const;
  for (const main of EN_MAIN) {
    for (const flooring of [false, true]) {
      for (const smoke of smokes) {
        for (const droplets of drops) {
          const plain = main === "A1" || main === "F" || (flooring && main === "E");
          if (plain && (smoke !== null || droplets !== null)) continue;
          if (flooring && (droplets !== null || smoke === 3)) continue;
          if (!flooring && main === "E" && (smoke !== null || (droplets !== null && droplets !== 2))) continue;
          out.push({ system: "european", main, flooring, smoke, droplets });
        }
      }
    }
  }
  return out;
}

describe("European classes (EN 13501-1, as summarised by test houses)", () => {
  it.each([
    ["B-s1,d0", { main: "B", flooring: false, smoke: 1, droplets: 0 }],
    ["A2-s1, d0", { main: "A2", flooring: false, smoke: 1, droplets: 0 }],
    ["b s2 d1", { main: "B", flooring: false, smoke: 2, droplets: 1 }],
    ["Bfl-s1", { main: "B", flooring: true, smoke: 1, droplets: null }],
    ["E-d2", { main: "E", flooring: false, smoke: null, droplets: 2 }],
    ["A1", { main: "A1", flooring: false, smoke: null, droplets: null }],
    ["D", { main: "D", flooring: false, smoke: null, droplets: null }],
  ])("reads %s", (text, expected) => {
    expect(read(text)).toEqual({ system: "european", ...expected });
  });

  it.each([
    ["A1-s1,d0", /A1 carries no smoke or droplet class/],
    ["E-s1", /class E carries no smoke class/],
    ["E-d0", /"d2"/],
    ["Bfl-s1,d0", /flooring class \(Bfl\) carries no droplet class/],
    ["Cfl-s3", /s1 or s2 only/],
    ["B-s4,d0", /not a class Cavitas can read/],
    ["G", /not a class Cavitas can read/],
    ["", /Enter a class/],
  ])("refuses %j with a message", (text, message) => {
    const r = parseFireClass(text);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toMatch(message);
  });

  it("prints every class it can read and reads the print back to the same class", () => {
    const all = allEuropean();
    // A1, F (2) + A1fl, Efl, Ffl (3) + E, E-d2 (2) + A2–D with 4 smoke × 4 droplet choices (64)
    // + A2fl–Dfl with 3 smoke choices (12), counted by hand from the rules above.
    expect(all).toHaveLength(83);
    for (const c of all) expect(read(formatFireClass(c))).toEqual(c);
    expect(formatFireClass({ system: "european", main: "B", flooring: false, smoke: 1, droplets: 0 })).toBe("B-s1,d0");
    expect(formatFireClass({ system: "european", main: "C", flooring: true, smoke: 2, droplets: null })).toBe("Cfl-s2");
  });
});

describe("North American flame spread classes (IBC §803.1.2, NFPA 101 §10.2.3.4, as summarised)", () => {
  it.each([
    [0, 0, "A"],
    [25, 450, "A"],
    [26, 100, "B"],
    [75, 450, "B"],
    [76, 0, "C"],
    [200, 450, "C"],
    [201, 50, null],
    [10, 451, null],
  ])("FSI %d, SDI %d is class %s", (fsi, sdi, expected) => {
    expect(classFromIndices(fsi, sdi)).toBe(expected);
  });

  it.each([
    ["Class A", { class: "A", fsi: null, sdi: null }],
    ["class b", { class: "B", fsi: null, sdi: null }],
    ["Class II", { class: "B", fsi: null, sdi: null }],
    ["FSI 20, SDI 150", { class: "A", fsi: 20, sdi: 150 }],
    ["flame spread 60 / smoke developed 300", { class: "B", fsi: 60, sdi: 300 }],
    ["Class C (FSI 90, SDI 400)", { class: "C", fsi: 90, sdi: 400 }],
    ["FSI 250, SDI 300 (no class)", { class: null, fsi: 250, sdi: 300 }],
  ])("reads %s", (text, expected) => {
    expect(read(text)).toEqual({ system: "north-american", ...expected });
  });

  it("reads a bare letter in the system of the standard it is declared under", () => {
    expect(read("A", "ASTM E84")).toEqual({ system: "north-american", class: "A", fsi: null, sdi: null });
    expect(read("B")).toMatchObject({ system: "european", main: "B" });
  });

  it.each([
    ["Class A (FSI 40, SDI 100)", /give Class B, not Class A/],
    ["FSI 20", /smoke-developed index \(SDI\) is missing/],
    ["SDI 20", /flame spread index \(FSI\) is missing/],
  ])("refuses %j with a message", (text, message) => {
    const r = parseFireClass(text);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toMatch(message);
  });

  it("prints what it reads and reads the print back", () => {
    for (const text of ["Class A", "Class B", "Class C", "Class A (FSI 20, SDI 150)", "FSI 250, SDI 300 (no class)"]) {
      expect(formatFireClass(read(text))).toBe(text);
      expect(read(formatFireClass(read(text)))).toEqual(read(text));
    }
  });
});
