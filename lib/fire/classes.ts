/**
 * Fire classes of interior finishes in the two systems Cavitas records (SPEC section 9,
 * SAFETY.md), read from and written back to the short strings people type and documents print.
 *
 * North America: the flame spread classes of the building codes (IBC §803.1.2, NFPA 101
 * §10.2.3.4), from the flame spread index (FSI) and smoke-developed index (SDI) of the tunnel
 * test (ASTM E84 / UL 723): Class A FSI 0–25, Class B 26–75, Class C 76–200, each with
 * SDI at most 450. "Class I/II/III" is the older name of A/B/C (from memory).
 *
 * Europe: EN 13501-1 reaction-to-fire classes A1, A2, B, C, D, E, F (A1 best), smoke s1–s3 and
 * flaming droplets d0–d2 (1 best / 0 best). A1 and F carry no sub-class; E carries no smoke
 * class and at most "-d2"; floorings carry the suffix "fl" and a smoke class s1 or s2 only, no
 * droplet class (A1fl, Efl and Ffl none). The sub-class rules beyond A1/E/fl are from memory of
 * the standard's tables, checked against test-house summaries only.
 *
 * A class may be partial: "B" with no sub-classes is a valid requirement ("B, any smoke and
 * droplet class") and a declared "B" simply does not state them.
 */
import type { FIRE_STANDARDS } from "@/lib/schemas/build-up";

export type FireStandard = (typeof FIRE_STANDARDS)[number];

export const NA_CLASSES = ["A", "B", "C"] as const;
export type NaClass = (typeof NA_CLASSES)[number];

export const EN_MAIN = ["A1", "A2", "B", "C", "D", "E", "F"] as const;
export type EnMain = (typeof EN_MAIN)[number];

/** A North American flame spread class, with the indices of the test when they were given. */
export interface NaFireClass {
  system: "north-american";
  /** null: indices outside every class (FSI above 200 or SDI above 450) */
  class: NaClass | null;
  fsi: number | null;
  sdi: number | null;
}

/** A European reaction-to-fire class. */
export interface EnFireClass {
  system: "european";
  main: EnMain;
  flooring: boolean;
  /** 1–3; null when not stated or when the class has none */
  smoke: 1 | 2 | 3 | null;
  /** 0–2; null when not stated or when the class has none */
  droplets: 0 | 1 | 2 | null;
}

export type FireClass = NaFireClass | EnFireClass;

export type FireParse = { ok: true; value: FireClass } | { ok: false; message: string };

/** The SDI limit of every flame spread class (IBC §803.1.2). */
export const SDI_LIMIT = 450;
/** Highest FSI of classes A, B, C (IBC §803.1.2). */
export const FSI_LIMITS: Record<NaClass, number> = { A: 25, B: 75, C: 200 };

/** The class that an FSI and SDI fall in, or null when they fall in none. */
export function classFromIndices(fsi: number, sdi: number): NaClass | null {
  if (!(fsi >= 0) || !(sdi >= 0) || sdi > SDI_LIMIT) return null;
  return NA_CLASSES.find((c) => fsi <= FSI_LIMITS[c]) ?? null;
}

const ROMAN: Record<string, NaClass> = { I: "A", II: "B", III: "C" };

function parseNorthAmerican(text: string, bare: boolean): FireParse | null {
  const t = text.trim();
  const classMatch = /^(?:class\s+)(I{1,3}|[ABC])\b/i.exec(t) ?? (bare ? /^([ABC])$/i.exec(t) : null);
  const fsi = /(?:fsi|flame[\s-]*spread(?:\s+index)?)\s*[:=]?\s*(\d+(?:\.\d+)?)/i.exec(t);
  const sdi = /(?:sdi|smoke[\s-]*developed(?:\s+index)?|smoke)\s*[:=]?\s*(\d+(?:\.\d+)?)/i.exec(t);
  if (!classMatch && !fsi && !sdi) return null;
  const stated = classMatch ? (ROMAN[classMatch[1].toUpperCase()] ?? (classMatch[1].toUpperCase() as NaClass)) : null;
  if (fsi && !sdi) return { ok: false, message: `"${text}": the smoke-developed index (SDI) is missing beside the FSI.` };
  if (sdi && !fsi) return { ok: false, message: `"${text}": the flame spread index (FSI) is missing beside the SDI.` };
  const indices = fsi && sdi ? { fsi: Number(fsi[1]), sdi: Number(sdi[1]) } : null;
  if (indices) {
    const derived = classFromIndices(indices.fsi, indices.sdi);
    if (stated && derived !== stated) {
      return {
        ok: false,
        message: `"${text}": FSI ${indices.fsi} and SDI ${indices.sdi} give ${derived ? `Class ${derived}` : "no class"}, not Class ${stated}.`,
      };
    }
    return { ok: true, value: { system: "north-american", class: derived, ...indices } };
  }
  return { ok: true, value: { system: "north-american", class: stated, fsi: null, sdi: null } };
}

const EN_PATTERN = /^(A1|A2|B|C|D|E|F)(fl)?(?:[\s,-]*s([1-3]))?(?:[\s,-]*d([0-2]))?$/i;

function parseEuropean(text: string): FireParse | null {
  const compact = text.trim().replace(/\s+/g, " ");
  const m = EN_PATTERN.exec(compact);
  if (!m) return null;
  const main = m[1].toUpperCase() as EnMain;
  const flooring = m[2] !== undefined;
  const smoke = m[3] ? (Number(m[3]) as 1 | 2 | 3) : null;
  const droplets = m[4] ? (Number(m[4]) as 0 | 1 | 2) : null;
  const name = `${main}${flooring ? "fl" : ""}`;
  const refuse = (why: string): FireParse => ({ ok: false, message: `"${text}": ${why} (EN 13501-1).` });
  if (main === "A1" || main === "F" || (flooring && main === "E")) {
    if (smoke !== null || droplets !== null) return refuse(`${name} carries no smoke or droplet class`);
  } else if (flooring) {
    if (droplets !== null) return refuse(`a flooring class (${name}) carries no droplet class`);
    if (smoke === 3) return refuse(`a flooring class carries smoke class s1 or s2 only`);
  } else if (main === "E") {
    if (smoke !== null) return refuse("class E carries no smoke class");
    if (droplets !== null && droplets !== 2) return refuse('class E carries no droplet class or "d2" (E-d2)');
  }
  return { ok: true, value: { system: "european", main, flooring, smoke, droplets } };
}

/**
 * Reads a class as typed: "B-s1,d0", "A2-s1, d0", "Bfl-s1", "E-d2", "Class A", "Class II",
 * "FSI 20, SDI 150", "Class A (FSI 15, SDI 40)". With the standard it was declared under, a
 * bare "A", "B" or "C" is read in that system (ASTM E84: the flame spread class).
 */
export function parseFireClass(text: string, standard?: FireStandard): FireParse {
  const t = text.trim();
  if (!t) return { ok: false, message: "Enter a class, for example B-s1,d0 or Class A." };
  const na = parseNorthAmerican(t, standard === "ASTM E84");
  if (na) return na;
  const en = parseEuropean(t);
  if (en) return en;
  return {
    ok: false,
    message: `"${text}" is not a class Cavitas can read. Write a European class such as B-s1,d0 or A2-s1,d0, or a North American one such as Class A or FSI 20, SDI 150.`,
  };
}

/** The class as documents print it; parseFireClass reads it back to the same class. */
export function formatFireClass(c: FireClass): string {
  if (c.system === "north-american") {
    const indices = c.fsi !== null && c.sdi !== null ? `FSI ${c.fsi}, SDI ${c.sdi}` : null;
    // A class of null only ever comes from indices that fall in no class.
    if (c.class === null) return `${indices} (no class)`;
    return indices ? `Class ${c.class} (${indices})` : `Class ${c.class}`;
  }
  const parts = [c.smoke !== null ? `s${c.smoke}` : null, c.droplets !== null ? `d${c.droplets}` : null].filter(Boolean);
  return `${c.main}${c.flooring ? "fl" : ""}${parts.length ? `-${parts.join(",")}` : ""}`;
}

export const SYSTEM_WORDS: Record<FireClass["system"], string> = {
  "north-american": "North American flame spread class (ASTM E84 / UL 723)",
  european: "European reaction-to-fire class (EN 13501-1)",
};
