/**
 * A declared fire class against the class a room requires. The rule: the declared class meets
 * the requirement when each part is at least as good: the main class, the smoke class and the
 * droplet class in EN 13501-1; the flame spread class (and so the SDI limit) in North America
 * (common practice of reading the classes; the codes themselves say which class a location
 * needs, not how to compare). The two systems measure different things, so a class in one is
 * never taken to meet a requirement in the other, and a flooring class ("fl", another test) is
 * not compared with a wall or ceiling class.
 *
 * This is a flag, not an approval: the governing code and the authority having jurisdiction
 * decide (SAFETY.md).
 */
import { EN_MAIN, type EnFireClass, type FireClass, type FireStandard, formatFireClass, NA_CLASSES, type NaFireClass, parseFireClass } from "./classes";

export type FirePart = "class" | "smoke" | "droplets";

export interface FireShortfall {
  part: FirePart;
  /** the declared part as printed ("s2"), null when the declared class does not state it */
  declared: string | null;
  required: string;
}

export type FireComparison =
  | { status: "meets" }
  | { status: "lower"; shortfalls: FireShortfall[] }
  | { status: "not-comparable"; reason: "systems" | "flooring" };

const mainRank = (c: EnFireClass) => EN_MAIN.indexOf(c.main);

/**
 * Class E without "-d2" passed the droplet criterion of its test; with "-d2" it did not. Within
 * E, no droplet class is therefore the better one (EN 13501-1, from memory).
 */
const dropletRank = (c: EnFireClass): number | null => (c.main === "E" && !c.flooring ? (c.droplets === 2 ? 2 : 0) : c.droplets);

function compareEuropean(declared: EnFireClass, required: EnFireClass): FireComparison {
  if (declared.flooring !== required.flooring) return { status: "not-comparable", reason: "flooring" };
  // A1 (and A1fl) is non-combustible: it has no sub-classes because it meets every one.
  if (declared.main === "A1") return { status: "meets" };
  const shortfalls: FireShortfall[] = [];
  if (mainRank(declared) > mainRank(required)) {
    shortfalls.push({ part: "class", declared: declared.main + (declared.flooring ? "fl" : ""), required: required.main + (required.flooring ? "fl" : "") });
  }
  if (required.smoke !== null && (declared.smoke === null ? declared.main !== "E" : declared.smoke > required.smoke)) {
    shortfalls.push({ part: "smoke", declared: declared.smoke === null ? null : `s${declared.smoke}`, required: `s${required.smoke}` });
  }
  const requiredDroplets = dropletRank(required);
  const declaredDroplets = dropletRank(declared);
  if (requiredDroplets !== null && (declaredDroplets === null || declaredDroplets > requiredDroplets)) {
    shortfalls.push({ part: "droplets", declared: declared.droplets === null ? null : `d${declared.droplets}`, required: required.droplets === null ? "no droplets (E)" : `d${required.droplets}` });
  }
  return shortfalls.length ? { status: "lower", shortfalls } : { status: "meets" };
}

function compareNorthAmerican(declared: NaFireClass, required: NaFireClass): FireComparison {
  if (required.class === null) return { status: "meets" };
  const rank = (c: NaFireClass) => (c.class === null ? NA_CLASSES.length : NA_CLASSES.indexOf(c.class));
  if (rank(declared) <= rank(required)) return { status: "meets" };
  // Indices that miss every class because of smoke fail on smoke; otherwise on flame spread.
  const smokeFails = declared.class === null && declared.sdi !== null && declared.sdi > 450;
  return {
    status: "lower",
    shortfalls: [
      smokeFails
        ? { part: "smoke", declared: `SDI ${declared.sdi}`, required: "SDI at most 450" }
        : { part: "class", declared: declared.class ? `Class ${declared.class}` : `FSI ${declared.fsi}`, required: `Class ${required.class}` },
    ],
  };
}

export function compareFireClass(declared: FireClass, required: FireClass): FireComparison {
  if (declared.system === "european" && required.system === "european") return compareEuropean(declared, required);
  if (declared.system === "north-american" && required.system === "north-american") return compareNorthAmerican(declared, required);
  return { status: "not-comparable", reason: "systems" };
}

/** What a submittal, the board and the check say about one build-up in one room. */
export type FireStatus = "meets" | "lower" | "missing" | "not-comparable" | "unreadable" | "no-requirement";

export interface FireFinding {
  status: FireStatus;
  /** the declared class as printed, when it could be read */
  declared: string | null;
  /** the required class as printed, when there is one that could be read */
  required: string | null;
  shortfalls: FireShortfall[];
  /** one sentence for people */
  message: string;
  /** true when the finding must be flagged (everything but "meets" and "no-requirement") */
  flagged: boolean;
}

const PART_WORDS: Record<FirePart, string> = { class: "main class", smoke: "smoke class", droplets: "droplet class" };

function shortfallWords(s: FireShortfall): string {
  return s.declared === null ? `its ${PART_WORDS[s.part]} is not stated (required ${s.required})` : `${PART_WORDS[s.part]} ${s.declared} against ${s.required}`;
}

/**
 * The finding for a build-up whose declared class is `declared` (as recorded with its test
 * report) in a room that requires `required` (null: no class entered).
 */
export function fireFinding(args: { standard: FireStandard; declared: string; required: string | null }): FireFinding {
  const base = { declared: null, required: null, shortfalls: [] as FireShortfall[] };
  const req = args.required?.trim() ? parseFireClass(args.required) : null;
  if (req && !req.ok) return { ...base, status: "unreadable", flagged: true, message: `The required class cannot be read: ${req.message}` };
  const required = req?.ok ? formatFireClass(req.value) : null;
  if (args.standard === "none" || !args.declared.trim()) {
    const message = required ? `No class is declared; the room requires ${required}.` : "No class is declared and no class is required: enter the class the governing code requires.";
    return { ...base, required, status: "missing", flagged: true, message };
  }
  const dec = parseFireClass(args.declared, args.standard);
  if (!dec.ok) return { ...base, required, status: "unreadable", flagged: true, message: `The declared class cannot be read: ${dec.message}` };
  const declared = formatFireClass(dec.value);
  const mismatch =
    (args.standard === "EN 13501-1" && dec.value.system !== "european") || (args.standard === "ASTM E84" && dec.value.system !== "north-american");
  if (mismatch) {
    return { ...base, declared, required, status: "unreadable", flagged: true, message: `${declared} is not a class of ${args.standard}, the standard it is declared under.` };
  }
  if (!req) return { ...base, declared, status: "no-requirement", flagged: false, message: `Declared ${declared}; no class is required for this room yet.` };
  const result = compareFireClass(dec.value, req.value);
  if (result.status === "meets") return { ...base, declared, required, status: "meets", flagged: false, message: `Declared ${declared} meets the required ${required}.` };
  if (result.status === "not-comparable") {
    const why = result.reason === "flooring" ? "a flooring class and a wall or ceiling class come from different tests" : "the two classes belong to different systems";
    return { ...base, declared, required, status: "not-comparable", flagged: true, message: `Declared ${declared} cannot be compared with the required ${required}: ${why}.` };
  }
  return {
    ...base,
    declared,
    required,
    shortfalls: result.shortfalls,
    status: "lower",
    flagged: true,
    message: `Declared ${declared} is lower than the required ${required}: ${result.shortfalls.map(shortfallWords).join("; ")}.`,
  };
}
