import fc from "fast-check";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { useTestEnvironment } from "../support/test-env";
import { addMember, makeAttachment, makeBuildUp, makeFirm, makeProject, makeUser, SPEC, TINY_PDF, TINY_PNG, uniqueEmail } from "../support/factories";
import { APP_URL, signIn } from "../support/http";
import { databaseDigest } from "../support/counts";
import { pathFor, routeFiles, type RouteFile } from "../support/route-files";
import { freshPin, freshRoom, paramsFor, type RouteWorld } from "../support/route-world";

// Property-based fuzzing of every route handler on disk (found by reading app/api, so later
// routes are fuzzed too) with malformed, oversized, wrongly typed and hostile bodies and path
// parameters, sent by a person with every right (consultant and firm administrator), so each
// request reaches validation. Whatever comes in: never a 500, never a stack trace, a database
// message or a file path in the answer, and a refusal changes nothing at all.

let envHandle: Awaited<ReturnType<typeof useTestEnvironment>>;
let world: RouteWorld;
let cookie = "";
const foreign: Record<string, string> = {}; // ids that exist, in a project this person is not in
const tally = { requests: 0, refused: 0, accepted: 0 };

beforeAll(async () => {
  envHandle = await useTestEnvironment();
  const firm = makeFirm();
  const projectId = makeProject(firm.id).id;
  const boss = await makeUser({ firmId: firm.id, isFirmAdmin: true });
  addMember(projectId, boss.id, "consultant");
  const architect = await makeUser();
  addMember(projectId, architect.id, "architect");
  cookie = await signIn(boss.email);
  const { actorFromHeaders } = await import("@/lib/auth/session");
  world = { projectId, consultant: (await actorFromHeaders(new Headers({ cookie })))!, architect: (await actorFromHeaders(new Headers({ cookie: await signIn(architect.email) })))!, mail: envHandle.mail };

  const theirs = makeProject(makeFirm("Another firm (fictional)").id);
  const them = await makeUser({ firmId: theirs.firmId });
  addMember(theirs.id, them.id, "consultant");
  addMember(theirs.id, architect.id, "architect");
  const theirWorld = { ...world, projectId: theirs.id, consultant: (await actorFromHeaders(new Headers({ cookie: await signIn(them.email) })))! };
  Object.assign(foreign, {
    projectId: theirs.id,
    roomId: await freshRoom(theirWorld),
    buildUpId: makeBuildUp(theirs.id).id,
    attachmentId: makeAttachment(theirs.id).id,
    pinId: await freshPin(theirWorld),
  });
});
afterAll(async () => {
  // The closing note quotes these counts.
  console.log(`fuzz: ${tally.requests} requests, ${tally.accepted} accepted, ${tally.refused} refused, no 500, nothing changed on refusal`);
  await envHandle.cleanup();
});

// ---- what is sent -------------------------------------------------------------------------

const HOSTILE_STRINGS = [
  "", " ", "\u0000", "\u202e", "null", "NaN", "-1", "1e309", "../../etc/passwd", "<script>alert(1)</script>", "' OR 1=1 --", "%00", "\uFEFF",
  "😀".repeat(50), "a".repeat(70_000), "__proto__", "constructor", "toString", "\ud800",
];
const hostileValue: fc.Arbitrary<unknown> = fc.oneof(
  fc.constantFrom(...HOSTILE_STRINGS),
  fc.string(),
  fc.integer(),
  fc.double(),
  fc.constantFrom(1e308, -1e308, Number.MAX_SAFE_INTEGER + 2, -0, 0.1 + 0.2, 0),
  fc.boolean(),
  fc.constant(null),
  fc.array(fc.jsonValue({ maxDepth: 2 }), { maxLength: 4 }),
  fc.dictionary(fc.string(), fc.jsonValue({ maxDepth: 2 }), { maxKeys: 4 }),
);

// Valid bodies for the routes known today, with every optional field present so that each one
// is swept; a route without one is fuzzed from nothing.
const ROOM = { name: "Fuzz room", use: "speech", shape: "shoebox", length: 8, width: 6, height: 3, temperature: 20, humidity: 50, pressure: 101325, target: null };
const roomWithChildren = (w: RouteWorld) => ({
  ...ROOM,
  surfaces: [{ key: "wall-a", name: "Wall A", kind: "wall", width: 8, height: 3, finish: "plaster-on-masonry", openings: [{ kind: "door", name: "Door", x: 1, y: 0, width: 0.9, height: 2.1, material: "timber-door" }] }],
  treatments: [{ surfaceKey: "wall-b", buildUpId: makeBuildUp(w.projectId).id, area: 2 }],
});
const BUILD_UP = { name: "Fuzz build-up", spec: SPEC, moduleWidth: 0.6, moduleHeight: 1.2, borderX: 0.03, borderY: 0.03, facingMaterial: "Birch plywood", fireStandard: "EN 13501-1", fireClass: "B-s1,d0", fireReportId: null, notes: "" };
const ALPHA = { "125": 0.1, "250": 0.2, "500": 0.3, "1000": 0.4, "2000": 0.5, "4000": 0.6 };
const TEMPLATES: Record<string, (w: RouteWorld) => unknown | Promise<unknown>> = {
  "PATCH /api/v1/me": () => ({ unitPreference: "imperial", name: "Fuzz person (fictional)" }),
  "POST /api/v1/projects": () => ({ name: "Fuzz project (fictional)", reference: "F-1", site: "Harbour side (fictional)" }),
  "PATCH /api/v1/projects/[projectId]": () => ({ edgeClearance: 0.05, name: "Renamed (fictional)", reference: "F-2", site: "Elsewhere (fictional)" }),
  "POST /api/v1/projects/[projectId]/invitations": () => ({ email: uniqueEmail(), role: "client", message: "Welcome" }),
  "POST /api/v1/firm/invitations": () => ({ email: uniqueEmail(), message: "Welcome" }),
  "POST /api/v1/projects/[projectId]/build-ups": () => BUILD_UP,
  "PUT /api/v1/projects/[projectId]/build-ups/[buildUpId]": () => ({ ...BUILD_UP, version: 1 }),
  "POST /api/v1/projects/[projectId]/rooms": roomWithChildren,
  "PUT /api/v1/projects/[projectId]/rooms/[roomId]": (w) => ({ ...roomWithChildren(w), version: 1 }),
  "POST /api/v1/projects/[projectId]/materials": () => ({ name: "Fuzz felt", category: "wall", alpha: ALPHA, source: "Invented for the fuzz run", reportId: null }),
  "PUT /api/v1/projects/[projectId]/rooms/[roomId]/boards/[surfaceKey]": (w) => ({
    version: 0,
    gridModule: 0.3,
    placements: [{ id: "a", buildUpId: makeBuildUp(w.projectId).id, code: "P-001", x: 0.1, y: 0.1, width: 0.6, height: 1.2 }],
  }),
  "PUT /api/v1/projects/[projectId]/rooms/[roomId]/boards/[surfaceKey]/drawing": () => ({ attachmentId: null, x: 0, y: 0, metresPerPixel: 0.01, opacity: 0.5 }),
  "POST /api/v1/projects/[projectId]/rooms/[roomId]/boards/[surfaceKey]/pins": () => ({ x: 1, y: 1, body: "Fuzz pin" }),
  "POST /api/v1/projects/[projectId]/pins/[pinId]/replies": () => ({ body: "Fuzz reply" }),
  "POST /api/v1/projects/[projectId]/pins/[pinId]/resolve": () => ({ resolved: true }),
  "PATCH /api/v1/projects/[projectId]/rooms/[roomId]": () => ({ fireRequired: "B-s1,d0" }),
  // A room with nothing to confirm, issued as revision A (later runs find A taken: 409).
  "POST /api/v1/projects/[projectId]/submittals": async (w) => ({ roomId: await freshRoom(w), letter: "A", confirm: [] }),
  "POST /api/v1/projects/[projectId]/submittals/[submittalId]/decision": () => ({ outcome: "returned", signature: "Fuzz Person", notes: "Fuzz notes", pdfSha256: "0".repeat(64) }),
  "PUT /api/v1/projects/[projectId]/submittals/[submittalId]/placements/[placementId]": () => ({ installed: true }),
  "POST /api/v1/evaluate": () => SPEC,
  "POST /api/v1/rate": () => ({ alpha: [0.2, 0.4, 0.7, 0.8, 0.7, 0.6] }),
  "POST /api/v1/reverb": () => ({ volume: 240, surfaces: [{ area: 268, alpha: [0.1, 0.1, 0.1, 0.1, 0.1, 0.1] }] }),
};

// Every path to a value inside a JSON document, for replacing one of them.
function paths(value: unknown, at: (string | number)[] = []): (string | number)[][] {
  if (value === null || typeof value !== "object") return [at];
  const keys = Array.isArray(value) ? value.map((_v, i) => i) : Object.keys(value);
  return [at, ...keys.flatMap((k) => paths((value as Record<string | number, unknown>)[k], [...at, k]))];
}

function replaceAt(doc: unknown, at: (string | number)[], value: unknown, remove: boolean): unknown {
  if (at.length === 0) return value;
  const copy = (Array.isArray(doc) ? [...doc] : { ...(doc as object) }) as Record<string | number, unknown>;
  const [head, ...rest] = at;
  if (rest.length === 0 && remove) delete copy[head];
  else copy[head] = replaceAt(copy[head], rest, value, remove);
  return copy;
}

type Sent = { text: string; type: string | null; note: string };
const json = (v: unknown, note: string): Sent => ({ text: JSON.stringify(v) ?? "null", type: "application/json", note });

function bodies(template: unknown | undefined): fc.Arbitrary<Sent> {
  const generic: fc.Arbitrary<Sent>[] = [
    fc.jsonValue({ maxDepth: 4 }).map((v) => json(v, "any JSON")),
    fc.string({ maxLength: 200 }).map((t) => ({ text: t, type: "application/json", note: "text that is rarely JSON" })),
    fc.constantFrom(
      { text: "[".repeat(10_000) + "]".repeat(10_000), type: "application/json", note: "nested 10 000 deep" },
      { text: '{"__proto__":{"polluted":true},"constructor":{"prototype":{"polluted":true}}}', type: "application/json", note: "prototype keys" },
      { text: JSON.stringify({ pad: "x".repeat(300 * 1024) }), type: "application/json", note: "over the JSON ceiling" },
      { text: "\xff\xfe\x00garbage", type: "application/json", note: "not UTF-8" },
    ),
  ];
  if (template === undefined) return fc.oneof(...generic);
  const spots = paths(template);
  const mutated = fc
    .tuple(fc.constantFrom(...spots), hostileValue, fc.boolean())
    .map(([at, value, remove]) => json(replaceAt(template, at, value, remove && at.length > 0), `${remove ? "without" : "hostile value at"} ${at.join(".") || "(root)"}`));
  const retyped = fc.constantFrom("text/plain", "application/x-www-form-urlencoded", "multipart/form-data; boundary=zz", "application/xml").map((type) => ({ text: JSON.stringify(template), type, note: `sent as ${type}` }));
  const extra = fc.tuple(fc.string(), hostileValue).map(([k, v]) => json({ ...(template as object), [k]: v }, "an unknown field"));
  return fc.oneof({ arbitrary: mutated, weight: 6 }, { arbitrary: retyped, weight: 1 }, { arbitrary: extra, weight: 1 }, ...generic.map((arbitrary) => ({ arbitrary, weight: 1 })));
}

const uploads = fc.record({
  purpose: fc.oneof(fc.constantFrom("fire-report", "test-report", "drawing", "photo"), fc.constantFrom(...HOSTILE_STRINGS.filter((s) => s.length < 100)), fc.string()),
  bytes: fc.oneof(fc.constantFrom(TINY_PDF, TINY_PNG, new Uint8Array(0)), fc.uint8Array({ maxLength: 512 })),
  name: fc.oneof(fc.constantFrom(...HOSTILE_STRINGS.filter((s) => s.length < 100)), fc.string({ unit: "grapheme", maxLength: 300 })),
  field: fc.constantFrom("file", "file", "file", "other"),
});

// ---- what must hold -----------------------------------------------------------------------

const LEAKS = /SQLITE|sqlite|constraint failed|node_modules|\/work\/|\/tmp\/|\.tsx?:\d+|\bat [\w.<>$]+ \(|TypeError|RangeError|ReferenceError|SyntaxError|Cannot read prop/;

async function send(file: RouteFile, params: Record<string, string>, body: { text?: string; type?: string | null; form?: FormData }) {
  const handler = (await file.load())[file.method] as (req: Request, ctx: { params: Promise<unknown> }) => Promise<Response>;
  const headers = new Headers({ origin: APP_URL, cookie });
  if (body.type) headers.set("content-type", body.type);
  const init: RequestInit = { method: file.method, headers };
  if (body.form) init.body = body.form;
  else if (body.text !== undefined && file.method !== "GET") init.body = body.text;
  const before = databaseDigest();
  const res = await handler(new Request(`${APP_URL}${pathFor(file.route, params)}`, init), { params: Promise.resolve(params) });
  const text = await res.text();
  tally.requests++;
  return { status: res.status, text, before };
}

function holds(file: RouteFile, sent: string, r: { status: number; text: string; before: string }) {
  const where = `${file.key} ← ${sent}: ${r.status} ${r.text.slice(0, 300)}`;
  expect(r.status, where).toBeLessThan(500);
  if (r.status >= 400) {
    tally.refused++;
    expect(r.text, where).not.toMatch(LEAKS);
    const parsed = JSON.parse(r.text) as { error?: { message?: string } };
    expect(parsed.error?.message, where).toBeTruthy();
    expect(databaseDigest(), `${where} changed the database`).toBe(r.before);
  } else tally.accepted++;
}

// ---- the runs -----------------------------------------------------------------------------

const RUNS = 25;
const files = routeFiles();

describe("fuzzed bodies, every route that reads one", () => {
  for (const file of files.filter((f) => f.method === "POST" || f.method === "PUT" || f.method === "PATCH")) {
    it(file.key, async () => {
      if (file.key.endsWith("/attachments") && file.method === "POST") {
        await fc.assert(
          fc.asyncProperty(uploads, async (u) => {
            const form = new FormData();
            form.set("purpose", u.purpose);
            form.set(u.field, new File([new Uint8Array(u.bytes)], u.name));
            holds(file, `upload ${JSON.stringify({ purpose: u.purpose, name: u.name.slice(0, 40), size: u.bytes.length })}`, await send(file, await paramsFor(file, world), { form }));
          }),
          { numRuns: RUNS },
        );
        return;
      }
      const params = await paramsFor(file, world);
      const template = await TEMPLATES[file.key]?.(world);
      await fc.assert(
        fc.asyncProperty(bodies(template), async (b) => {
          holds(file, b.note, await send(file, file.params.includes("roomId") || file.params.includes("buildUpId") ? await paramsFor(file, world) : params, b));
        }),
        { numRuns: RUNS },
      );
    });
  }
});

// Beside the random runs, a sweep that misses no field: each value of each known body replaced
// in turn by the usual suspects (an empty id was a 500 once).
const SUSPECTS: unknown[] = ["", null, "\u0000", -1, 1e308, true, {}];

describe("every field of every known body, each replaced by the usual suspects", () => {
  for (const file of files.filter((f) => TEMPLATES[f.key])) {
    it(file.key, async () => {
      const params = await paramsFor(file, world);
      const template = await TEMPLATES[file.key](world);
      const leaves = paths(template).filter((at) => at.length > 0);
      for (const at of leaves) {
        for (const value of SUSPECTS) holds(file, `${at.join(".")} = ${JSON.stringify(value)}`, await send(file, params, json(replaceAt(template, at, value, false), "")));
      }
    });
  }
});

describe("fuzzed path parameters, every route", () => {
  // (A lone surrogate cannot be put in a URL at all, so it is left out here.)
  const idLike = fc.oneof(fc.constantFrom(...HOSTILE_STRINGS.filter((s) => s.length < 1000 && s !== "\ud800")), fc.string({ maxLength: 80 }), fc.uuid());
  for (const file of files.filter((f) => f.params.length > 0)) {
    it(file.key, async () => {
      const valid = await paramsFor(file, world);
      await fc.assert(
        fc.asyncProperty(fc.constantFrom(...file.params), fc.oneof(idLike, fc.constant("<foreign>")), async (name, value) => {
          // Another project's real id in this project's path must look exactly like no id at all.
          const isForeign = value === "<foreign>";
          const params = { ...valid, [name]: isForeign ? (foreign[name] ?? "x") : value };
          const template = await TEMPLATES[file.key]?.(world);
          const r = await send(file, params, file.method === "GET" || file.method === "DELETE" ? {} : { text: JSON.stringify(template ?? {}), type: "application/json" });
          holds(file, `${name}=${JSON.stringify(params[name]).slice(0, 60)}`, r);
          if (isForeign && foreign[name] && name !== "projectId") expect(r.status, `${file.key} with another project's ${name}`).toBeGreaterThanOrEqual(400);
        }),
        { numRuns: Math.ceil(RUNS / 2) },
      );
    });
  }
});

// better-auth's own endpoints, through the same gate: the same promises for what they answer.
const AUTH_TEMPLATES: Record<string, () => unknown> = {
  "/sign-in/email": () => ({ email: uniqueEmail(), password: "wrong-password-123" }),
  "/sign-up/email": () => ({ email: uniqueEmail(), password: "a-long-password-1", name: "Fuzz (fictional)" }),
  "/update-user": () => ({ name: "Fuzz (fictional)" }),
  "/change-password": () => ({ currentPassword: "wrong-password-123", newPassword: "another-password-1" }),
  "/request-password-reset": () => ({ email: uniqueEmail(), redirectTo: "/sign-in" }),
  "/reset-password": () => ({ token: "not-a-token", newPassword: "another-password-1" }),
};

describe("fuzzed bodies, better-auth's endpoints", () => {
  for (const [endpoint, template] of Object.entries(AUTH_TEMPLATES)) {
    it(`POST /api/auth${endpoint}`, async () => {
      const { POST } = await import("@/app/api/auth/[...all]/route");
      const file: RouteFile = { key: `POST /api/auth${endpoint}`, method: "POST", route: `/api/auth${endpoint}`, params: [], load: async () => ({ POST }) };
      // A refusal from better-auth is JSON of its own shape; what matters is no 500 and no leak.
      const check = (note: string, r: { status: number; text: string; before: string }) => {
        expect(r.status, `${file.key} ← ${note}: ${r.text.slice(0, 300)}`).toBeLessThan(500);
        if (r.status >= 400) {
          tally.refused++;
          expect(r.text, `${file.key} ← ${note}`).not.toMatch(LEAKS);
          expect(databaseDigest(), `${file.key} ← ${note} changed the database`).toBe(r.before);
        } else tally.accepted++;
      };
      await fc.assert(
        fc.asyncProperty(bodies(template()), async (b) => check(b.note, await send(file, {}, b))),
        { numRuns: RUNS },
      );
      const base = template() as Record<string, unknown>;
      for (const key of Object.keys(base)) {
        for (const value of SUSPECTS) check(`${key} = ${JSON.stringify(value)}`, await send(file, {}, json({ ...base, [key]: value }, "")));
      }
    });
  }
});
