import Database from "better-sqlite3";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { startTestServer, type TestServer } from "./support/server";
import { ApiClient, newProject, panels, runRoom } from "./support/api-client";

// A real server (`next start` on the production build) is killed with SIGKILL in the middle
// of a burst of writes, several times. After each kill the database must pass SQLite's
// integrity check and hold every write the server had acknowledged: a room it answered 201 for,
// a board at least at the version it answered 200 for, with that save's panels or a later one's.

let server: TestServer;
let client: ApiClient;
let projectId = "";
let buildUpId = "";
const CRASHES = 3;
const WRITERS = 6;

const acked = { rooms: new Map<string, string>(), boards: new Map<string, { version: number; codes: string[] }>() };
const counts = { sent: 0, acked: 0, lost: 0 };

beforeAll(async () => {
  server = await startTestServer();
  client = await ApiClient.signIn(server.baseUrl, "consultant@example.test");
  ({ projectId, buildUpId } = await newProject(client, "Crash run (fictional)"));
});
afterAll(async () => {
  console.log(`crash: ${CRASHES} SIGKILLs, ${counts.sent} writes sent, ${counts.acked} acknowledged and all found again, ${counts.lost} cut off unanswered`);
  await server?.stop();
});

// One writer: alternately creates a room and saves the board of a room of its own, until the
// server stops answering.
async function writer(w: number, round: number, stop: { now: boolean }) {
  const own = await client.ok("POST", `/api/v1/projects/${projectId}/rooms`, runRoom(`Writer ${w} round ${round}`));
  let version = 0;
  for (let i = 0; !stop.now; i++) {
    counts.sent++;
    try {
      if (i % 2 === 0) {
        const name = `Room ${w}.${round}.${i}`;
        const res = await client.call("POST", `/api/v1/projects/${projectId}/rooms`, runRoom(name));
        if (res.status === 201) {
          acked.rooms.set(res.json.id, name);
          counts.acked++;
        }
      } else {
        const placed = panels(1 + (i % 20), buildUpId, `w${w}`);
        const res = await client.call("PUT", `/api/v1/projects/${projectId}/rooms/${own.id}/boards/wall-a`, { version, placements: placed });
        if (res.status === 200) {
          version = res.json.version;
          acked.boards.set(own.id, { version, codes: placed.map((p) => p.code) });
          counts.acked++;
        }
      }
    } catch {
      counts.lost++; // the connection died with the server: not acknowledged, not expected
      return;
    }
  }
}

async function expectEverythingAcknowledged() {
  const db = new Database(server.databasePath, { readonly: true });
  try {
    expect(db.pragma("integrity_check", { simple: true })).toBe("ok");
    expect(db.pragma("foreign_key_check")).toEqual([]);
  } finally {
    db.close();
  }
  const rooms = await client.ok("GET", `/api/v1/projects/${projectId}/rooms`);
  const names = new Map<string, string>(rooms.rooms.map((r: { id: string; name: string }) => [r.id, r.name]));
  for (const [id, name] of acked.rooms) expect(names.get(id), `room ${name}`).toBe(name);
  for (const [roomId, saved] of acked.boards) {
    const board = await client.ok("GET", `/api/v1/projects/${projectId}/rooms/${roomId}/boards/wall-a`);
    expect(board.version).toBeGreaterThanOrEqual(saved.version);
    if (board.version === saved.version) expect(board.placements.map((p: { code: string }) => p.code)).toEqual(saved.codes);
  }
}

describe("a server killed in the middle of writes", () => {
  it(`loses no acknowledged write over ${CRASHES} SIGKILLs`, async () => {
    for (let round = 0; round < CRASHES; round++) {
      const stop = { now: false };
      const before = counts.acked;
      const writers = Array.from({ length: WRITERS }, (_v, w) => writer(w, round, stop));
      // Let the burst run, then kill at a moment that varies from round to round.
      while (counts.acked - before < 40) await new Promise((r) => setTimeout(r, 20));
      await new Promise((r) => setTimeout(r, 50 + round * 137));
      await server.crash();
      stop.now = true;
      await Promise.all(writers);
      await expect(fetch(`${server.baseUrl}/api/health`)).rejects.toThrow();
      await server.restart();
      expect((await fetch(`${server.baseUrl}/api/health`)).status).toBe(200);
      client = await ApiClient.signIn(server.baseUrl, "consultant@example.test");
      await expectEverythingAcknowledged();
    }
    expect(acked.rooms.size).toBeGreaterThan(CRASHES * 10);
  });
});
