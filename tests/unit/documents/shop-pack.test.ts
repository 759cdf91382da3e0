import { strFromU8, unzipSync } from "fflate";
import { beforeAll, describe, expect, it } from "vitest";
import { buildShopPack, cutListCsv, placementScheduleCsv, type ShopPack, type SubmittalDecision } from "@/lib/documents";
import { buildSnapshot, freezeSnapshot, sha256Hex, type SubmittalSnapshot } from "@/lib/submittals";
import { demoRehearsalSource } from "../../support/demo-room";
import { sameBytes } from "../../support/bytes";
import { pdfPages } from "../../support/pdf-text";

const approval: SubmittalDecision = { outcome: "approved-as-noted", signer: { name: "Cleo Client (fictional)" }, decidedAt: "2026-03-05T16:20:00Z", notes: "Clear the sounder (pin 1)." };
const PDF_HASH = "c0ffee".padEnd(64, "0");

let snapshot: SubmittalSnapshot;
let pack: ShopPack;
let files: Record<string, Uint8Array>;
let pages: string[];

beforeAll(async () => {
  snapshot = buildSnapshot(await demoRehearsalSource());
  pack = await buildShopPack({ snapshot, submittalPdfHash: PDF_HASH, approval });
  files = unzipSync(pack.zip);
  pages = await pdfPages(files["lra-24_rehearsal-room_rev-A_shop-drawing.pdf"]);
}, 180_000);

describe("the shop pack of the demo rehearsal room", () => {
  it("is the same zip, byte for byte, when built again", async () => {
    const again = await buildShopPack({ snapshot, submittalPdfHash: PDF_HASH, approval });
    expect(again.sha256).toBe(pack.sha256);
    expect(sameBytes(again.zip, pack.zip)).toBe(true);
  }, 120_000);

  it("holds the drawing, one SVG per panel type, two CSVs and a manifest of their hashes", () => {
    expect(Object.keys(files)).toEqual(["lra-24_rehearsal-room_rev-A_shop-drawing.pdf", "patterns/T1.svg", "cut-list.csv", "placement-schedule.csv", "manifest.txt"]);
    const manifest = strFromU8(files["manifest.txt"]);
    for (const name of Object.keys(files).filter((n) => n !== "manifest.txt")) expect(manifest).toContain(`${sha256Hex(files[name])}  ${name}`);
    expect(manifest).toContain(`Snapshot SHA-256: ${freezeSnapshot(snapshot).hash}`);
    expect(manifest).toContain(`Submittal PDF SHA-256: ${PDF_HASH}`);
  });

  it("prints revision, approval and both hashes on every sheet", () => {
    const hash = freezeSnapshot(snapshot).hash;
    expect(pages.length).toBeGreaterThanOrEqual(4);
    for (const page of pages) {
      for (const half of [hash.slice(0, 32), hash.slice(32), PDF_HASH.slice(0, 32), PDF_HASH.slice(32)]) expect(page).toContain(half);
      expect(page).toContain("Approved as noted Cleo Client (fictional), 5 March 2026, 16:20 UTC");
      expect(page).toMatch(/REVISION A Issued 2 March 2026/);
    }
  });

  it("counts the holes of the bass panel as worked by hand", () => {
    // 600 × 1200 mm less 40 mm borders: a 520 × 1120 mm field; Ø8 mm at 40 mm square:
    // floor((520 − 8) / 40) + 1 = 13 across, floor((1120 − 8) / 40) + 1 = 28 up, 364 holes;
    // 30 panels: 10 920 holes. Open area over the whole panel 364 · π · 4² / (600 · 1200) = 2.54 %.
    const text = pages.join("\n");
    expect(text).toContain("T1 Bass panel, rehearsal room 600 mm × 1200 mm 30 21.6 m² 364 holes 10,920 holes 3.14 % / 2.54 %");
    expect(text).toContain("ROWS × HOLES 28 rows of 13, 40 mm apart");
    expect(text).toContain("FIRST HOLE centre 60 mm from the left edge, 60 mm from the bottom edge");
  });

  it("sets out each panel from the surface's datum as the seed's array puts it (by hand)", () => {
    // The seed's array on wall A: origin (550, 900) mm, 600 × 1200 mm panels 100 mm apart,
    // 15 across, bottom row first: P-003 at x = 550 + 2 · 700 = 1950; P-016 starts the second
    // row at y = 900 + 1300 = 2200; P-030 at x = 550 + 14 · 700 = 10 350.
    const text = pages.join("\n");
    expect(text).toContain("P-001 Wall A (length) T1 550 mm 900 mm 600 mm 1200 mm");
    expect(text).toContain("P-003 Wall A (length) T1 1950 mm 900 mm 600 mm 1200 mm");
    expect(text).toContain("P-016 Wall A (length) T1 550 mm 2200 mm 600 mm 1200 mm");
    expect(text).toContain("P-030 Wall A (length) T1 10350 mm 2200 mm 600 mm 1200 mm");
  });

  it("lists the cut list: facing boards and infill for the 30 bass panels", () => {
    const text = pages.join("\n");
    expect(text).toContain("facing T1 16 mm perforated MDF, lacquered (demo product) 600 mm 1200 mm 16 mm 30");
    expect(text).toContain("infill T1 porous infill, flow resistivity 10,000 Pa·s/m², behind the facing 600 mm 1200 mm 50 mm 30");
  });

  it("draws the facing pattern at 1:1 in millimetres, every hole where the drawing puts it", () => {
    const svg = strFromU8(files["patterns/T1.svg"]);
    expect(svg).toContain('width="600mm" height="1200mm" viewBox="0 0 600 1200"');
    const circles = [...svg.matchAll(/<circle cx="([\d.]+)" cy="([\d.]+)" r="([\d.]+)"\/>/g)].map((m) => m.slice(1).map(Number));
    expect(circles).toHaveLength(364);
    // First hole 60 mm from the left and from the bottom: y = 1200 − 60 from the top in SVG.
    expect(circles[0]).toEqual([60, 1140, 4]);
    expect(circles[363]).toEqual([540, 60, 4]);
  });

  it("writes the CSV files in the reader's units", () => {
    expect(placementScheduleCsv(snapshot)).toContain("\r\nP-003,wall-a,Wall A (length),T1,T1,1950.0,900.0,600.0,1200.0\r\n");
    // 1.95 m / 0.0254 m per inch = 76.772 in; 1.2 m = 47.244 in.
    const imperial = placementScheduleCsv(snapshot, "imperial");
    expect(imperial.split("\r\n")[0]).toBe("code,surface_key,surface,type,build_up,x_in,y_in,width_in,height_in");
    expect(imperial).toContain("P-003,wall-a,Wall A (length),T1,T1,76.772,35.433,23.622,47.244");
    expect(cutListCsv(snapshot)).toContain('facing,T1,"Bass panel, rehearsal room","16 mm perforated MDF, lacquered (demo product)",600.0,1200.0,16.0,30');
  });

  it("is refused for a returned revision", async () => {
    await expect(buildShopPack({ snapshot, submittalPdfHash: PDF_HASH, approval: { ...approval, outcome: "returned" } })).rejects.toThrow("only for an approved revision");
  });
});
