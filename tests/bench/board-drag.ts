import crypto from "node:crypto";
import Database from "better-sqlite3";
import { startTestServer } from "../e2e/support/server";
import { newBrowserContext } from "../e2e/support/browser";
import { runDragBenchmark } from "@/lib/board/drag-benchmark";

// Board benchmark in Chromium: drag one panel across a board of 500 placements and report the
// frame rate and the time from the last drag event to the updated check, against the same drag
// on a board of 10 placements measured in the same run. Goal: ≥ 55 frames a second and
// < 16 ms to the updated check. Prints figures; asserts nothing.

const ROOM = "Rehearsal room";
const CASES = [
  { label: "500 placements", key: "wall-a", columns: 25, rows: 20 },
  { label: "10 placements (baseline)", key: "wall-c", columns: 5, rows: 2 },
];

function seedBoards(databasePath: string) {
  const db = new Database(databasePath);
  const roomRow = db.prepare("select id from room where name = ?").get(ROOM) as { id: string };
  const buildUpId = (db.prepare("select id from build_up where name like 'Bass panel%'").get() as { id: string }).id;
  for (const c of CASES) {
    const s = db.prepare("select id, width, height from surface where room_id = ? and key = ?").get(roomRow.id, c.key) as { id: string; width: number; height: number };
    let b = db.prepare("select id from board where surface_id = ?").get(s.id) as { id: string } | undefined;
    if (!b) {
      b = { id: crypto.randomUUID() };
      db.prepare("insert into board (id, surface_id, version, grid_module, drawing_x, drawing_y, drawing_metres_per_pixel, drawing_opacity, created_at, updated_at) values (?, ?, 1, 0.3, 0, 0, 0.01, 0.5, ?, ?)").run(b.id, s.id, Date.now(), Date.now());
    }
    db.prepare("delete from placement where board_id = ?").run(b.id);
    const insert = db.prepare("insert into placement (id, board_id, build_up_id, code, x, y, width, height, position) values (?, ?, ?, ?, ?, ?, ?, ?, ?)");
    const w = s.width / c.columns;
    const h = s.height / c.rows;
    let n = 0;
    for (let r = 0; r < c.rows; r++)
      for (let col = 0; col < c.columns; col++) {
        n++;
        insert.run(crypto.randomUUID(), b.id, buildUpId, `P-${String(n).padStart(3, "0")}`, col * w + 0.02, r * h + 0.02, w * 0.8, h * 0.8, n);
      }
  }
  db.close();
}

async function main() {
  // The board's own work per frame (snap, rules, treated area), without drawing, in Node.
  const logic = runDragBenchmark({ count: 500, frames: 300 });
  console.log(
    `\nBoard logic per drag frame, 500 placements: ${logic.msPerFrame.total.toFixed(3)} ms (snap ${logic.msPerFrame.snap.toFixed(3)}, rules ${logic.msPerFrame.rules.toFixed(3)}, area ${logic.msPerFrame.area.toFixed(3)}); ` +
      `worst ${logic.worstFrameMs.toFixed(2)} ms; overlaps ${logic.ratios.overlaps.toFixed(1)}× and snap ${logic.ratios.snap.toFixed(1)}× faster than the plain way, same run`,
  );
  const server = await startTestServer({ beforeStart: seedBoards });
  const { context, close } = await newBrowserContext();
  const page = context.pages()[0] ?? (await context.newPage());
  try {
    await page.goto(`${server.baseUrl}/sign-in`);
    await page.getByLabel("E-mail").fill("consultant@example.test");
    await page.getByLabel("Password").fill("cavity-demo-2026");
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL("**/projects");
    const projectId = await page.locator('[data-testid="project-table"] a').first().getAttribute("href");
    const roomsRes = await page.request.get(`${server.baseUrl}/api/v1${projectId}/rooms`);
    const roomId = ((await roomsRes.json()) as { rooms: { id: string; name: string }[] }).rooms.find((r) => r.name === ROOM)!.id;
    const results: { label: string; fps: number; checkMs: number; events: number }[] = [];
    for (const c of CASES) {
      await page.goto(`${server.baseUrl}${projectId}/rooms/${roomId}/board/${c.key}`);
      const canvas = page.getByTestId("board-canvas");
      await canvas.locator("canvas").first().waitFor();
      await page.waitForTimeout(800);
      const box = (await canvas.boundingBox())!;
      // The first panel's middle, from the canvas's own drawing (the view fits the surface to
      // whatever size the canvas has).
      const start = (await page.evaluate(`(() => {
        const stage = window.Konva.stages[0];
        const r = stage.find(".panel")[0].getClientRect();
        const b = stage.container().getBoundingClientRect();
        return { x: b.x + r.x + r.width / 2, y: b.y + r.y + r.height / 2 };
      })()`)) as { x: number; y: number };
      // A string, not a function: tsx would add helpers the page does not have.
      await page.evaluate(`(() => {
        window.__frames = 0;
        window.__counting = true;
        const tick = () => { if (!window.__counting) return; window.__frames++; requestAnimationFrame(tick); };
        requestAnimationFrame(tick);
      })()`);
      await page.mouse.move(start.x, start.y);
      const cdp = process.env.CAVITAS_PROFILE ? await context.newCDPSession(page) : null;
      if (cdp) {
        await cdp.send("Profiler.enable");
        await cdp.send("Profiler.start");
      }
      await page.mouse.down();
      const moves = 150;
      const t0 = Date.now();
      for (let i = 1; i <= moves; i++) {
        await page.mouse.move(start.x + (i * box.width * 0.5) / moves, start.y - (i * box.height * 0.15) / moves);
        await page.waitForTimeout(8);
      }
      const elapsed = (Date.now() - t0) / 1000;
      await page.waitForTimeout(150);
      const stats = (await page.evaluate(`(() => { window.__counting = false; return { frames: window.__frames, board: window.__cavitasBoard ?? null }; })()`)) as {
        frames: number;
        board: { lastDragAt: number; checkAt: number; frames: number } | null;
      };
      await page.mouse.up();
      if (cdp) {
        const { profile } = (await cdp.send("Profiler.stop")) as { profile: { nodes: { id: number; callFrame: { functionName: string; url: string; lineNumber: number }; hitCount?: number }[] } };
        const self = new Map<string, number>();
        for (const n of profile.nodes) {
          const k = `${n.callFrame.functionName || "(anon)"} ${n.callFrame.url.split("/").pop()}:${n.callFrame.lineNumber}`;
          self.set(k, (self.get(k) ?? 0) + (n.hitCount ?? 0));
        }
        console.log(`profile ${c.label}:`, [...self.entries()].sort((a, b) => b[1] - a[1]).slice(0, 25));
      }
      results.push({
        label: c.label,
        fps: stats.frames / (elapsed + 0.15),
        checkMs: stats.board ? stats.board.checkAt - stats.board.lastDragAt : NaN,
        events: stats.board?.frames ?? 0,
      });
    }
    console.log("\nCavitas board benchmark (Debian Chromium, headless, one panel dragged across the board)\n");
    for (const r of results) {
      console.log(`  ${r.label.padEnd(26)} ${r.fps.toFixed(1)} frames/s; check updated ${r.checkMs.toFixed(1)} ms after the last drag event (${r.events} drag events)`);
    }
    const [big, base] = results;
    console.log(`\n  frame rate 500 / 10 placements: ${(big.fps / base.fps).toFixed(2)}; time to check 500 / 10: ${(big.checkMs / Math.max(0.1, base.checkMs)).toFixed(2)}`);
    console.log(`  goal: ≥ 55 frames/s and < 16 ms to the updated check with 500 placements\n`);
  } finally {
    await close();
    await server.stop();
  }
}

void main();
