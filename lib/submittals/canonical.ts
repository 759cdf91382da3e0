/**
 * The canonical JSON form of a snapshot, so that one set of values always gives one text and
 * one SHA-256, whoever wrote the object and in whatever order its keys were set. It follows the
 * JSON Canonicalization Scheme (RFC 8785) in its main points: no whitespace, object members
 * sorted by their keys' UTF-16 code units (§3.2.3), strings and numbers as ECMAScript's
 * JSON.stringify writes them (§3.2.2). Two Cavitas choices go further: every number is first
 * rounded to 12 significant digits (so float noise in the last bits of a computed value, which
 * no document shows, cannot change the hash) and −0 becomes 0; members whose value is
 * undefined are left out, as JSON.stringify does. NaN, Infinity and anything that is not plain
 * data are refused, naming where they were found.
 */
import { createHash } from "node:crypto";

export const SIGNIFICANT_DIGITS = 12;

export type Json = null | boolean | number | string | Json[] | { [key: string]: Json };

export class CanonicalFormError extends Error {
  constructor(
    readonly path: string,
    message: string,
  ) {
    super(`${path || "(the value)"}: ${message}`);
    this.name = "CanonicalFormError";
  }
}

export function normaliseNumber(x: number, path = ""): number {
  if (!Number.isFinite(x)) throw new CanonicalFormError(path, `${x} is not a finite number`);
  const rounded = Number(x.toPrecision(SIGNIFICANT_DIGITS));
  return Object.is(rounded, -0) ? 0 : rounded;
}

const isPlainObject = (v: object) => {
  const proto = Object.getPrototypeOf(v);
  return proto === Object.prototype || proto === null;
};

/**
 * The value as canonical JSON data: numbers normalised, undefined members dropped, dates as
 * ISO 8601 text. `JSON.parse(canonicalJson(x))` deep-equals it.
 */
export function canonicalValue(value: unknown, path = ""): Json {
  if (value === null) return null;
  switch (typeof value) {
    case "boolean":
    case "string":
      return value;
    case "number":
      return normaliseNumber(value, path);
    case "object":
      break;
    default:
      throw new CanonicalFormError(path, `a ${typeof value} cannot be part of a snapshot`);
  }
  if (value instanceof Date) return value.toISOString();
  if (Array.isArray(value)) {
    return value.map((item, i) => {
      if (item === undefined) throw new CanonicalFormError(`${path}[${i}]`, "a list cannot hold undefined");
      return canonicalValue(item, `${path}[${i}]`);
    });
  }
  if (!isPlainObject(value)) throw new CanonicalFormError(path, "only plain objects, lists, text, numbers, booleans and null can be part of a snapshot");
  const out: { [key: string]: Json } = {};
  for (const key of Object.keys(value)) {
    const member = (value as Record<string, unknown>)[key];
    if (member === undefined) continue;
    out[key] = canonicalValue(member, path ? `${path}.${key}` : key);
  }
  return out;
}

/**
 * Written out by hand rather than by JSON.stringify of a sorted object: JavaScript objects keep
 * integer-like keys ("63", "125", the octave labels) in numeric order whatever the insertion
 * order, where RFC 8785 sorts them as text ("125" before "63").
 */
function write(value: Json): string {
  if (value === null || typeof value !== "object") return JSON.stringify(value);
  if (Array.isArray(value)) return `[${value.map(write).join(",")}]`;
  const keys = Object.keys(value).sort();
  return `{${keys.map((key) => `${JSON.stringify(key)}:${write(value[key])}`).join(",")}}`;
}

/** The canonical JSON text of a value (RFC 8785 key order, numbers normalised, no whitespace). */
export function canonicalJson(value: unknown): string {
  return write(canonicalValue(value));
}

/** SHA-256 (FIPS 180-4) of text in UTF-8, or of bytes, as 64 lowercase hex digits. */
export function sha256Hex(data: string | Uint8Array): string {
  return createHash("sha256").update(data).digest("hex");
}

/** The SHA-256 of a value's canonical JSON: what identifies a snapshot. */
export function canonicalHash(value: unknown): string {
  return sha256Hex(canonicalJson(value));
}
