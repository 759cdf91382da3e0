import os from "node:os";
import autocannon, { type Result } from "autocannon";
import { startTestServer } from "../e2e/support/server";
import { ApiClient, newProject, panels, RUN_SPEC, runRoom } from "../e2e/support/api-client";

// npm run load: the production build served by `next start` on 127.0.0.1 with the demo
// scenario, under autocannon, for the four requests a working day leans on. Prints requests/s,
// p50, p99 and errors for each. Goals on a 2-core machine (not asserted anywhere): 500
// evaluations/s at p99 under 50 ms; the rooms list at p99 under 250 ms at 50 connections;
// no errors. CAVITAS_LOAD_SECONDS sets each measured run's length (default 10 s).

const SECONDS = Number(process.env.CAVITAS_LOAD_SECONDS ?? 10);
const WARM_UP = 2;
const BOARDS = 10;

type Scenario = { name: string; connections: number; before?: () => Promise<void>; options: (base: string) => Parameters<typeof autocannon>[0] };

async function main() {
  const server = await startTestServer();
  try {
    const client = await ApiClient.signIn(server.baseUrl, "consultant@example.test");
    const headers = client.headers();
    // The demo project with the most rooms, for the page data and the rooms list.
    const { projects } = await client.ok("GET", "/api/v1/projects");
    const sized = await Promise.all(projects.map(async (p: { id: string }) => ({ id: p.id, rooms: (await client.ok("GET", `/api/v1/projects/${p.id}/rooms`)).rooms.length })));
    const demo = sized.sort((a, b) => b.rooms - a.rooms)[0];
    // Board saves need a board per connection (each save names the version it replaces).
    const own = await newProject(client, "Load run (fictional)");
    const boards: string[] = [];
    for (let i = 0; i < BOARDS; i++) {
      const room = await client.ok("POST", `/api/v1/projects/${own.projectId}/rooms`, runRoom(`Load room ${i + 1}`));
      boards.push(`/api/v1/projects/${own.projectId}/rooms/${room.id}/boards/wall-a`);
    }
    let nextBoard = 0;
    const versions = new Map<string, number>();

    const scenarios: Scenario[] = [
      { name: "evaluate", connections: 10, options: (url) => ({ url: `${url}/api/v1/evaluate`, method: "POST", headers, body: JSON.stringify(RUN_SPEC) }) },
      {
        name: "board save (20 panels)",
        connections: BOARDS,
        // A run cut off at its end may leave a save answered to nobody: start from the stored versions.
        before: async () => {
          for (const path of boards) versions.set(path, (await client.ok("GET", path)).version);
        },
        options: (url) => ({
          url,
          setupClient: (c) => {
            const path = boards[nextBoard++ % boards.length];
            const body = () => JSON.stringify({ version: versions.get(path) ?? 0, placements: panels(20, own.buildUpId, "load") });
            c.setRequests([{ method: "PUT", path, headers, body: body() }]);
            // A save answered 200 moved the board one version on; the next names that one.
            c.on("response", (status) => {
              if (status === 200) versions.set(path, (versions.get(path) ?? 0) + 1);
              c.setBody(body());
            });
          },
        }),
      },
      { name: "project page data", connections: 10, options: (url) => ({ url: `${url}/api/v1/projects/${demo.id}`, headers }) },
      { name: `rooms list (${demo.rooms} rooms)`, connections: 50, options: (url) => ({ url: `${url}/api/v1/projects/${demo.id}/rooms`, headers }) },
    ];

    const rows: string[] = [];
    for (const s of scenarios) {
      await s.before?.();
      await autocannon({ ...s.options(server.baseUrl), connections: s.connections, duration: WARM_UP });
      await s.before?.();
      const load = os.loadavg()[0].toFixed(1);
      const r: Result = await autocannon({ ...s.options(server.baseUrl), connections: s.connections, duration: SECONDS });
      rows.push(row(s.name, s.connections, r, load));
    }
    console.log(
      [
        "",
        `Cavitas under load: next start on 127.0.0.1, ${SECONDS} s per run after ${WARM_UP} s of warm-up, ${os.cpus().length} cores`,
        "request                       conns   req/s   p50 ms   p99 ms   errors   load before",
        ...rows,
        "",
        "Goals (2-core machine): evaluate ≥ 500 req/s at p99 < 50 ms; rooms list p99 < 250 ms at 50 connections; no errors.",
        "",
      ].join("\n"),
    );
  } finally {
    await server.stop();
  }
}

function row(name: string, connections: number, r: Result, load: string): string {
  const errors = r.errors + r.timeouts + r.non2xx;
  return `${name.padEnd(28)} ${String(connections).padStart(6)} ${r.requests.average.toFixed(0).padStart(7)} ${String(r.latency.p50).padStart(8)} ${String(r.latency.p99).padStart(8)} ${String(errors).padStart(8)}   ${load}`;
}

void main().catch((e) => {
  console.error(e);
  process.exit(1);
});
