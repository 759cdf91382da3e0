/**
 * npm run bench (submittal workflow): what a consultant and a client wait for in the app, on
 * the demo rehearsal room in a real temporary SQLite database with a local mail catcher:
 * issuing a revision (snapshot, submittal PDF, storing it, the transaction that supersedes the
 * previous revision, the e-mails) against the bare PDF render of the same room; and a client's
 * approval (decision record and the shop pack in both unit systems, stored and mailed) against
 * one bare shop pack. Each issue is a new revision (A, B, C …) superseding the one before.
 * Prints figures; asserts nothing. Run with `tsx --conditions=import`.
 */
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { median, medianInTurns, ratio, seconds, type Timing } from "./timing";

async function main() {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "cavitas-bench-"));
  const { startMailCatcher } = await import("@/lib/mail/catcher");
  const mail = await startMailCatcher({ smtpPort: 0, httpPort: 0 });
  process.env.CAVITAS_DATA_DIR = dir;
  process.env.CAVITAS_SMTP_PORT = String(mail.smtpPort);
  process.env.CAVITAS_MAIL_HTTP_PORT = String(mail.httpPort);
  const { getDb, closeDb } = await import("@/db/client");
  const { seedDemo } = await import("@/db/seed");
  const { roomRows } = await import("@/db/queries/room-rows");
  const { and, eq } = await import("drizzle-orm");
  const { project, room, user } = await import("@/db/schema");
  const { buildShopPack, renderSubmittalPdf } = await import("@/lib/documents");
  const { buildSnapshot } = await import("@/lib/submittals");
  const s = await import("@/lib/services/submittals");
  try {
    await seedDemo(getDb());
    const actor = (key: string) => {
      const u = getDb().select().from(user).where(eq(user.id, `demo-user-${key}`)).get()!;
      return { userId: u.id, email: u.email, name: u.name, firmId: u.firmId, isFirmAdmin: u.isFirmAdmin, unitPreference: u.unitPreference };
    };
    const consultant = actor("consultant");
    const client = actor("client");
    const p = getDb().select().from(project).where(eq(project.reference, "LRA-24")).get()!;
    const r = getDb().select().from(room).where(and(eq(room.projectId, p.id), eq(room.name, "Rehearsal room"))).get()!;
    const issue = () => {
      const { letter, items } = s.issueReadiness(consultant, p.id, r.id);
      return s.issueSubmittal(consultant, p.id, { roomId: r.id, letter, confirm: items.map((i) => i.key) });
    };
    const snapshot = buildSnapshot({ ...roomRows(getDb(), p.id, r.id)!, consultant: { name: consultant.name, firm: null }, revision: { letter: "A", issuedAt: new Date() } });

    console.log(`\nCavitas submittal workflow benchmark (${os.cpus().length} cores, load average ${os.loadavg()[0].toFixed(1)}; median of warm runs)\n`);
    const [issued, bare] = await medianInTurns(5, issue, () => renderSubmittalPdf(snapshot));
    console.log(`issue a revision of the demo rehearsal room, in the app: ${seconds(issued)}; bare PDF render (baseline) ${seconds(bare)}; ratio ${ratio(issued, bare)}`);

    const approval = { outcome: "approved" as const, signer: { name: "Cleo Client" }, decidedAt: new Date().toISOString(), notes: "" };
    // Each approval needs a revision just issued; only the approval itself is timed.
    let target: { id: string } | null = null;
    const approve = async () => {
      const id = target!.id;
      await s.decideSubmittal(client, p.id, id, { outcome: "approved", signature: "Cleo Client", pdfSha256: s.getSubmittal(client, p.id, id).pdf!.sha256 });
    };
    const approvals: Timing[] = [];
    const packs: Timing[] = [];
    for (let i = 0; i < 4; i++) {
      target = await issue();
      approvals.push(await median(1, approve, false));
      packs.push(await median(1, () => buildShopPack({ snapshot, submittalPdfHash: "0".repeat(64), approval }), false));
    }
    const mid = (ts: Timing[]) => ts.slice(1).sort((a, b) => a.wall - b.wall)[1];
    const [approved, pack] = [mid(approvals), mid(packs)];
    console.log(`approve a revision (decision record, shop packs in mm and in inches, stored, mailed): ${seconds(approved)}; one bare shop pack (baseline) ${seconds(pack)}; ratio ${ratio(approved, pack)}\n`);
  } finally {
    closeDb();
    await mail.close();
    fs.rmSync(dir, { recursive: true, force: true });
  }
}

void main();
