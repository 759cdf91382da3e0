import { beforeAll, describe, expect, inject, it } from "vitest";
import { ApiClient, newProject, panels, runBuildUp, runRoom } from "./support/api-client";

// Two clients (two sessions, as two tabs or two people) race to save the same board, room and
// build-up from the same version, again and again, on the production server. Exactly one wins
// each race (200), the other is told it lost (409), and what is stored afterwards is the
// winner's save: nothing acknowledged is lost, nothing refused is half-written.

const ROUNDS = 100;
let a: ApiClient;
let b: ApiClient;
let projectId = "";
let buildUpId = "";
const tally = { races: 0 };

beforeAll(async () => {
  const base = inject("baseUrl");
  [a, b] = await Promise.all([ApiClient.signIn(base, "consultant@example.test"), ApiClient.signIn(base, "consultant@example.test")]);
  ({ projectId, buildUpId } = await newProject(a, "Race run (fictional)"));
  return () => console.log(`races: ${tally.races} races of two clients, each with exactly one winner and its save kept`);
});

type Racer = { save: (who: ApiClient, version: number, tag: string) => Promise<{ status: number; json: any }>; stored: () => Promise<{ version: number; mark: string }> };

async function race(target: Racer, rounds: number) {
  for (let i = 0; i < rounds; i++) {
    const { version } = await target.stored();
    const [ra, rb] = await Promise.all([target.save(a, version, `a${i}`), target.save(b, version, `b${i}`)]);
    const statuses = [ra.status, rb.status].sort();
    expect(statuses, `round ${i}: ${JSON.stringify([ra.json, rb.json]).slice(0, 300)}`).toEqual([200, 409]);
    const winner = ra.status === 200 ? "a" : "b";
    const loser = ra.status === 200 ? rb : ra;
    expect(loser.json.error.issues[0].field).toBe("version");
    const now = await target.stored();
    expect(now).toEqual({ version: version + 1, mark: `${winner}${i}` });
    tally.races++;
  }
}

describe("two clients racing the same thing", () => {
  it(`the same board, ${ROUNDS} times`, async () => {
    const room = await a.ok("POST", `/api/v1/projects/${projectId}/rooms`, runRoom("Raced board"));
    const path = `/api/v1/projects/${projectId}/rooms/${room.id}/boards/wall-a`;
    const count = (tag: string) => (tag.startsWith("a") ? 3 : 5);
    await race(
      {
        // Each side places a different number of panels, their ids marked with its tag.
        save: (who, version, tag) => who.call("PUT", path, { version, placements: panels(count(tag), buildUpId, tag) }),
        stored: async () => {
          const board = await a.ok("GET", path);
          const mark: string = board.placements[0]?.id.replace(/-0$/, "") ?? "";
          if (mark) expect(board.placements).toHaveLength(count(mark));
          return { version: board.version, mark };
        },
      },
      ROUNDS,
    );
  });

  it(`the same room, ${ROUNDS} times`, async () => {
    const room = await a.ok("POST", `/api/v1/projects/${projectId}/rooms`, runRoom("Raced room"));
    const path = `/api/v1/projects/${projectId}/rooms/${room.id}`;
    await race(
      {
        save: (who, version, tag) => who.call("PUT", path, { ...runRoom(tag), length: tag.startsWith("a") ? 12 : 14, version }),
        stored: async () => {
          const now = await a.ok("GET", path);
          if (now.version > 1) expect(now.length).toBe(now.name.startsWith("a") ? 12 : 14);
          return { version: now.version, mark: now.name };
        },
      },
      ROUNDS,
    );
  });

  it(`the same build-up, ${ROUNDS} times`, async () => {
    const made = await a.ok("POST", `/api/v1/projects/${projectId}/build-ups`, runBuildUp("Raced build-up"));
    const path = `/api/v1/projects/${projectId}/build-ups/${made.id}`;
    await race(
      {
        save: (who, version, tag) => who.call("PUT", path, { ...runBuildUp(tag), notes: `saved by ${tag}`, version }),
        stored: async () => {
          const now = await a.ok("GET", path);
          if (now.version > 1) expect(now.notes).toBe(`saved by ${now.name}`);
          return { version: now.version, mark: now.name };
        },
      },
      ROUNDS,
    );
  });
});
