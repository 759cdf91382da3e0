/**
 * The cut list and the placement schedule as CSV (RFC 4180: comma-separated, CRLF line ends,
 * fields quoted when they hold a comma, quote or line break), lengths as plain numbers in the
 * unit the header names (mm to a tenth, or inches to a thousandth), for spreadsheets and
 * cutting software.
 */
import type { SubmittalSnapshot } from "@/lib/submittals";
import type { UnitPreference } from "@/lib/units";
import { cutList, placementRows } from "./quantities";

const INCH = 0.0254;

function field(value: string | number): string {
  const text = String(value);
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

const table = (rows: (string | number)[][]) => rows.map((r) => r.map(field).join(",")).join("\r\n") + "\r\n";

function lengthColumn(units: UnitPreference) {
  return units === "imperial" ? { unit: "in", of: (m: number) => (m / INCH).toFixed(3) } : { unit: "mm", of: (m: number) => (m * 1000).toFixed(1) };
}

export function cutListCsv(s: SubmittalSnapshot, units: UnitPreference = "metric"): string {
  const l = lengthColumn(units);
  return table([
    ["item", "type", "build_up", "material", `width_${l.unit}`, `height_${l.unit}`, `thickness_${l.unit}`, "quantity"],
    ...cutList(s).map((r) => [r.item, r.type, r.buildUp, r.material, l.of(r.width), l.of(r.height), l.of(r.thickness), r.quantity]),
  ]);
}

export function placementScheduleCsv(s: SubmittalSnapshot, units: UnitPreference = "metric"): string {
  const l = lengthColumn(units);
  return table([
    ["code", "surface_key", "surface", "type", "build_up", `x_${l.unit}`, `y_${l.unit}`, `width_${l.unit}`, `height_${l.unit}`],
    ...placementRows(s).map((r) => [r.code, r.surfaceKey, r.surface, r.type, r.buildUp, l.of(r.x), l.of(r.y), l.of(r.width), l.of(r.height)]),
  ]);
}
