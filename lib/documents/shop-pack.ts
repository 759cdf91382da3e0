/**
 * The shop pack of an approved revision, one zip (fflate): the shop drawing PDF, each panel
 * type's facing pattern as SVG at 1:1 in millimetres, the cut list and the placement schedule
 * as CSV, and a manifest with every file's SHA-256. Deterministic: files in a fixed order, every
 * entry stamped with the approval's time, so the same snapshot and approval give the same zip.
 */
import { strToU8, zipSync, type Zippable } from "fflate";
import { sha256Hex, type SubmittalSnapshot } from "@/lib/submittals";
import { OUTCOME_WORDS } from "./decision";
import { cutListCsv, placementScheduleCsv } from "./csv";
import { formatInstant } from "./format";
import { facingPatternSvg } from "./pattern-svg";
import { placedTypes } from "./quantities";
import type { ShopPackInput } from "./shop/context";
import { renderShopDrawingPdf, shopContext } from "./shop/document";

export interface ShopPackFile {
  name: string;
  bytes: Uint8Array;
  sha256: string;
}

export interface ShopPack {
  /** "LRA-24_rehearsal-room_rev-B_shop-pack.zip" */
  name: string;
  zip: Uint8Array;
  sha256: string;
  files: ShopPackFile[];
}

const slug = (text: string) =>
  text
    .normalize("NFKD")
    .replace(/[^\w\s-]/g, "")
    .trim()
    .toLowerCase()
    .replace(/[\s_]+/g, "-")
    .replace(/-+/g, "-") || "room";

/** "LRA-24_rehearsal-room_rev-B": how every file of a revision begins. */
export const documentBaseName = (s: Pick<SubmittalSnapshot, "project" | "room" | "revision">) =>
  `${slug(s.project.reference ?? s.project.name)}_${slug(s.room.name)}_rev-${s.revision.letter}`;

/**
 * Zip entries carry DOS time in local components (fflate reads getHours() and friends), so the
 * instant's UTC components are given as local ones: the same stamp whatever the server's zone.
 * An hour skipped by a daylight-saving change falls back to noon of that day.
 */
function zipTime(iso: string): Date {
  const d = new Date(iso);
  const local = new Date(d.getUTCFullYear(), d.getUTCMonth(), d.getUTCDate(), d.getUTCHours(), d.getUTCMinutes(), d.getUTCSeconds());
  return local.getHours() === d.getUTCHours() ? local : new Date(d.getUTCFullYear(), d.getUTCMonth(), d.getUTCDate(), 12);
}

export async function buildShopPack(input: ShopPackInput): Promise<ShopPack> {
  const c = shopContext(input);
  const { s } = c;
  const units = input.units ?? "metric";
  const base = documentBaseName(s);
  const file = (name: string, bytes: Uint8Array): ShopPackFile => ({ name, bytes, sha256: sha256Hex(bytes) });
  const files: ShopPackFile[] = [
    file(`${base}_shop-drawing.pdf`, await renderShopDrawingPdf(input)),
    ...placedTypes(s).map((t) => file(`patterns/${t.code}.svg`, strToU8(facingPatternSvg(s, t.code, c.hash)))),
    file("cut-list.csv", strToU8(cutListCsv(s, units))),
    file("placement-schedule.csv", strToU8(placementScheduleCsv(s, units))),
  ];
  const manifest = [
    `Cavitas shop pack: ${s.project.name}${s.project.reference ? ` (${s.project.reference})` : ""}, ${s.room.name}, revision ${s.revision.letter}`,
    `Approval: ${OUTCOME_WORDS[c.approval.outcome]} by ${c.approval.signer.name}, ${formatInstant(c.approval.decidedAt)}`,
    `Submittal PDF SHA-256: ${c.pdfHash}`,
    `Snapshot SHA-256: ${c.hash}`,
    `Lengths in the CSV files: ${units === "imperial" ? "inches" : "millimetres"}; SVG patterns: millimetres at 1:1.`,
    "",
    "SHA-256 of each file:",
    ...files.map((f) => `${f.sha256}  ${f.name}`),
    "",
  ].join("\r\n");
  files.push(file("manifest.txt", strToU8(manifest)));
  const mtime = zipTime(c.approval.decidedAt);
  const entries: Zippable = {};
  for (const f of files) entries[f.name] = [f.bytes, { mtime, level: f.name.endsWith(".pdf") ? 0 : 6 }];
  const zip = zipSync(entries);
  return { name: `${base}_shop-pack.zip`, zip, sha256: sha256Hex(zip), files };
}
