/**
 * npm run bench (documents): render times of the submittal PDF of the demo rehearsal room
 * (goal < 2 s) and of the shop pack for a board of 500 placements (goal < 5 s), each against a
 * baseline measured in the same run: the one-page decision record for the submittal, the shop
 * pack of a 10-placement board for the 500. The demo room comes from a real temporary SQLite
 * database seeded with the demo data. Warm times (fonts loaded, code compiled), the median of a
 * few runs, wall clock and this process's CPU time (the machine may be shared). Prints figures;
 * asserts nothing. Run with `tsx --conditions=import` (the PDF
 * renderer's hyphenation package exports ESM only).
 */
import os from "node:os";
import { makeArray } from "@/lib/board/arrays";
import { formatCode } from "@/lib/board/labels";
import { buildShopPack, renderDecisionRecordPdf, renderSubmittalPdf, type SubmittalDecision } from "@/lib/documents";
import { buildSnapshot, type SnapshotSource } from "@/lib/submittals";
import { demoRehearsalSource } from "../support/demo-room";
import { median, ratio, seconds } from "./timing";

const APPROVAL: SubmittalDecision = { outcome: "approved", signer: { name: "Cleo Client (fictional)" }, decidedAt: "2026-03-05T16:20:00Z", notes: "" };
const PDF_HASH = "0".repeat(64);

/** The demo room with wall A's board replaced by `columns` × `rows` bass panels. */
function withBoard(source: SnapshotSource, columns: number, rows: number): SnapshotSource {
  const wallA = source.surfaces.find((s) => s.key === "wall-a")!;
  const board = source.boards.find((b) => b.surfaceId === wallA.id)!;
  const template = source.placements.find((p) => p.boardId === board.id)!;
  const width = (wallA.width - 0.1) / columns - 0.02;
  const height = (wallA.height - 0.1) / rows - 0.02;
  const rects = makeArray({ origin: { x: 0.06, y: 0.06 }, width, height, columns, rows, gapX: 0.02, gapY: 0.02 });
  const placements = rects.map((r, i) => ({ ...template, id: `bench-${i}`, code: formatCode(i + 1), position: i, ...r }));
  return { ...source, placements: [...source.placements.filter((p) => p.boardId !== board.id), ...placements] };
}

async function main() {
  const load = os.loadavg()[0].toFixed(1);
  console.log(`\nCavitas documents benchmark (${os.cpus().length} cores, load average ${load}; median of warm runs)\n`);
  const source = await demoRehearsalSource();
  const snapshot = buildSnapshot(source);
  const record = await median(5, () => renderDecisionRecordPdf({ snapshot, submittalPdfHash: PDF_HASH, decision: APPROVAL }));
  const submittal = await median(5, () => renderSubmittalPdf(snapshot));
  console.log(`submittal PDF, demo rehearsal room: ${seconds(submittal)} (goal < 2 s); decision record (1 page, baseline) ${seconds(record)}; ratio ${ratio(submittal, record)}`);

  const big = buildSnapshot(withBoard(source, 25, 20));
  const small = buildSnapshot(withBoard(source, 5, 2));
  const packSmall = await median(3, () => buildShopPack({ snapshot: small, submittalPdfHash: PDF_HASH, approval: APPROVAL }));
  const packBig = await median(3, () => buildShopPack({ snapshot: big, submittalPdfHash: PDF_HASH, approval: APPROVAL }));
  const pack = await buildShopPack({ snapshot: big, submittalPdfHash: PDF_HASH, approval: APPROVAL });
  console.log(
    `shop pack, board of ${big.placements.length} placements: ${seconds(packBig)} (goal < 5 s; ${(pack.zip.length / 1024).toFixed(0)} KB, ${pack.files.length} files); board of ${small.placements.length} (baseline) ${seconds(packSmall)}; ratio ${ratio(packBig, packSmall)}\n`,
  );
}

main();
