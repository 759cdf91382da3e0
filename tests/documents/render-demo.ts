/**
 * Renders the demo rehearsal room's documents into a folder for looking at, page by page:
 *   npx tsx --conditions=import tests/documents/render-demo.ts [out-dir, default .data/documents]
 * then, for example, `pdftoppm -r 70 -png out-dir/submittal.pdf out-dir/submittal`.
 */
import fs from "node:fs";
import path from "node:path";
import { unzipSync } from "fflate";
import { buildShopPack, renderDecisionRecordPdf, renderSubmittalPdf, type SubmittalDecision } from "@/lib/documents";
import { buildSnapshot, sha256Hex } from "@/lib/submittals";
import { demoRehearsalSource } from "../support/demo-room";

export const DEMO_APPROVAL: SubmittalDecision = {
  outcome: "approved-as-noted",
  signer: { name: "Cleo Client (fictional)", email: "client@example.test" },
  decidedAt: "2026-03-05T16:20:00Z",
  notes: "Approved on condition that the top row on wall A clears the fire alarm sounder by 300 mm (pin 1).",
};

async function main() {
  const out = process.argv[2] ?? ".data/documents";
  fs.mkdirSync(out, { recursive: true });
  const snapshot = buildSnapshot(await demoRehearsalSource());
  const submittal = await renderSubmittalPdf(snapshot);
  const submittalPdfHash = sha256Hex(submittal);
  fs.writeFileSync(path.join(out, "submittal.pdf"), submittal);
  fs.writeFileSync(path.join(out, "decision-record.pdf"), await renderDecisionRecordPdf({ snapshot, submittalPdfHash, decision: DEMO_APPROVAL }));
  const pack = await buildShopPack({ snapshot, submittalPdfHash, approval: DEMO_APPROVAL });
  fs.writeFileSync(path.join(out, pack.name), pack.zip);
  for (const [name, bytes] of Object.entries(unzipSync(pack.zip))) {
    fs.mkdirSync(path.dirname(path.join(out, "pack", name)), { recursive: true });
    fs.writeFileSync(path.join(out, "pack", name), bytes);
  }
  console.log(`written to ${out}: submittal.pdf, decision-record.pdf, ${pack.name} (unpacked in pack/)`);
}

main();
