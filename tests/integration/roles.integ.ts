import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { useTestEnvironment } from "../support/test-env";
import { addMember, makeAttachment, makeBuildUp, makeFirm, makeProject, makeUser, SPEC, TEST_PASSWORD, TINY_PDF, uniqueEmail } from "../support/factories";
import { tokenIn, waitForMail } from "../support/mail";
import { getDb } from "@/db/client";
import { call, signIn } from "../support/http";
import { roleMay, type ProjectAction } from "@/lib/permissions";
import { PROJECT_ROLES, type ProjectRole } from "@/lib/roles";
import { tableCounts } from "../support/counts";
import { actorOf } from "../support/actors";
import { designedRoom, issueConfirmed, pdfHashOf, photoWithLocation } from "../support/submittals";
import { pathFor, routeFiles } from "../support/route-files";
import { freshInvitation as inviteIn, freshPin as pinIn, freshRoom as roomIn, paramsFor, walkRoom, type RouteWorld } from "../support/route-world";

// Walks every guarded route handler for every project role, for a signed-in outsider, and
// for no session. Expectations come from the permissions table (lib/permissions.ts, the
// product specification's section 2), so the table and the server cannot drift apart.

type Who = ProjectRole | "outsider" | "admin" | "none";
const EVERYONE: Who[] = [...PROJECT_ROLES, "outsider", "admin", "none"];

let envHandle: Awaited<ReturnType<typeof useTestEnvironment>>;
let projectId = "";
let firmId = "";
let world: RouteWorld;
const cookies = {} as Record<Exclude<Who, "none">, string>;
const emails = {} as Record<Exclude<Who, "none">, string>;

beforeAll(async () => {
  envHandle = await useTestEnvironment();
  const firm = makeFirm();
  firmId = firm.id;
  const project = makeProject(firm.id);
  projectId = project.id;
  for (const role of PROJECT_ROLES) {
    const u = await makeUser({ firmId: role === "consultant" ? firm.id : null });
    addMember(project.id, u.id, role);
    emails[role] = u.email;
    cookies[role] = await signIn(u.email);
    if (role === "client") clientName = u.name.replace(/\s*\([^)]*\)\s*/g, " ").trim();
  }
  const outsider = await makeUser({ firmId: firm.id });
  emails.outsider = outsider.email;
  cookies.outsider = await signIn(outsider.email);
  const admin = await makeUser({ firmId: firm.id, isFirmAdmin: true });
  emails.admin = admin.email;
  cookies.admin = await signIn(admin.email);
  const { actorFromHeaders } = await import("@/lib/auth/session");
  const actorOf = async (who: ProjectRole) => (await actorFromHeaders(new Headers({ cookie: cookies[who] })))!;
  world = { projectId, consultant: await actorOf("consultant"), architect: await actorOf("architect"), mail: envHandle.mail };
});
afterAll(() => envHandle.cleanup());

const freshInvitation = () => inviteIn(world);
const freshRoom = () => roomIn(world);
const freshPin = () => pinIn(world);

type Endpoint = {
  key: string; // "METHOD /api/v1/..." as the file system names it
  load: () => Promise<Record<string, any>>;
  method: "GET" | "POST" | "PATCH" | "PUT" | "DELETE";
  writes: boolean;
  prepare?: (who: Who) => Promise<{ params?: Record<string, string>; body?: unknown; form?: FormData }>;
  expected: (who: Who) => number;
  /** puts the actor back as it was (a fresh session, the original password) for later routes */
  restore?: (who: Who) => Promise<void>;
};

const projectRule = (action: ProjectAction, okStatus: number) => (who: Who) => {
  if (who === "none") return 401;
  if (who === "outsider" || who === "admin") return 404;
  return roleMay(who, action) ? okStatus : 403;
};
const signedIn = (okStatus: number) => (who: Who) => (who === "none" ? 401 : okStatus);

const ENDPOINTS: Endpoint[] = [
  { key: "GET /api/v1/me", method: "GET", writes: false, load: () => import("@/app/api/v1/me/route"), expected: signedIn(200) },
  {
    key: "PATCH /api/v1/me",
    method: "PATCH",
    writes: true,
    load: () => import("@/app/api/v1/me/route"),
    prepare: async () => ({ body: { unitPreference: "imperial" } }),
    expected: signedIn(200),
  },
  { key: "GET /api/v1/projects", method: "GET", writes: false, load: () => import("@/app/api/v1/projects/route"), expected: signedIn(200) },
  {
    key: "POST /api/v1/projects",
    method: "POST",
    writes: true,
    load: () => import("@/app/api/v1/projects/route"),
    prepare: async () => ({ body: { name: "Another project (fictional)" } }),
    // Creating a project is for members of a consultancy (who become its consultant).
    expected: (who) => (who === "none" ? 401 : ["consultant", "outsider", "admin"].includes(who) ? 201 : 403),
  },
  {
    key: "GET /api/v1/projects/[projectId]",
    method: "GET",
    writes: false,
    load: () => import("@/app/api/v1/projects/[projectId]/route"),
    prepare: async () => ({ params: { projectId } }),
    expected: projectRule("project.view", 200),
  },
  {
    key: "PATCH /api/v1/projects/[projectId]",
    method: "PATCH",
    writes: true,
    load: () => import("@/app/api/v1/projects/[projectId]/route"),
    prepare: async () => ({ params: { projectId }, body: { edgeClearance: 0.06 } }),
    expected: projectRule("project.edit", 200),
  },
  {
    key: "GET /api/v1/projects/[projectId]/members",
    method: "GET",
    writes: false,
    load: () => import("@/app/api/v1/projects/[projectId]/members/route"),
    prepare: async () => ({ params: { projectId } }),
    expected: projectRule("team.view", 200),
  },
  {
    key: "GET /api/v1/projects/[projectId]/invitations",
    method: "GET",
    writes: false,
    load: () => import("@/app/api/v1/projects/[projectId]/invitations/route"),
    prepare: async () => ({ params: { projectId } }),
    expected: projectRule("team.invite", 200),
  },
  {
    key: "POST /api/v1/projects/[projectId]/invitations",
    method: "POST",
    writes: true,
    load: () => import("@/app/api/v1/projects/[projectId]/invitations/route"),
    prepare: async () => ({ params: { projectId }, body: { email: uniqueEmail(), role: "client" } }),
    expected: projectRule("team.invite", 201),
  },
  {
    key: "DELETE /api/v1/projects/[projectId]/invitations/[invitationId]",
    method: "DELETE",
    writes: true,
    load: () => import("@/app/api/v1/projects/[projectId]/invitations/[invitationId]/route"),
    prepare: async () => ({ params: { projectId, invitationId: (await freshInvitation()).id } }),
    expected: projectRule("team.invite", 200),
  },
  {
    key: "GET /api/v1/invitations/[token]",
    method: "GET",
    writes: false,
    load: () => import("@/app/api/v1/invitations/[token]/route"),
    prepare: async () => ({ params: { token: (await freshInvitation()).token } }),
    // Public: the token in the link is the secret; it shows only what the e-mail said.
    expected: () => 200,
  },
  {
    key: "POST /api/v1/invitations/[token]/accept",
    method: "POST",
    writes: true,
    load: () => import("@/app/api/v1/invitations/[token]/accept/route"),
    prepare: async () => ({ params: { token: (await freshInvitation()).token } }),
    // Nobody here is the invitee, so everybody signed in is refused.
    expected: (who) => (who === "none" ? 401 : 403),
  },
  {
    key: "GET /api/v1/projects/[projectId]/build-ups",
    method: "GET",
    writes: false,
    load: () => import("@/app/api/v1/projects/[projectId]/build-ups/route"),
    prepare: async () => ({ params: { projectId } }),
    expected: projectRule("design.view", 200),
  },
  {
    key: "POST /api/v1/projects/[projectId]/build-ups",
    method: "POST",
    writes: true,
    load: () => import("@/app/api/v1/projects/[projectId]/build-ups/route"),
    prepare: async () => ({ params: { projectId }, body: buildUpBody() }),
    expected: projectRule("design.edit", 201),
  },
  {
    key: "GET /api/v1/projects/[projectId]/build-ups/[buildUpId]",
    method: "GET",
    writes: false,
    load: () => import("@/app/api/v1/projects/[projectId]/build-ups/[buildUpId]/route"),
    prepare: async () => ({ params: { projectId, buildUpId: makeBuildUp(projectId).id } }),
    expected: projectRule("design.view", 200),
  },
  {
    key: "PUT /api/v1/projects/[projectId]/build-ups/[buildUpId]",
    method: "PUT",
    writes: true,
    load: () => import("@/app/api/v1/projects/[projectId]/build-ups/[buildUpId]/route"),
    prepare: async () => ({ params: { projectId, buildUpId: makeBuildUp(projectId).id }, body: { ...buildUpBody(), version: 1 } }),
    expected: projectRule("design.edit", 200),
  },
  {
    key: "DELETE /api/v1/projects/[projectId]/build-ups/[buildUpId]",
    method: "DELETE",
    writes: true,
    load: () => import("@/app/api/v1/projects/[projectId]/build-ups/[buildUpId]/route"),
    prepare: async () => ({ params: { projectId, buildUpId: makeBuildUp(projectId).id } }),
    expected: projectRule("design.edit", 200),
  },
  {
    key: "POST /api/v1/projects/[projectId]/attachments",
    method: "POST",
    writes: true,
    load: () => import("@/app/api/v1/projects/[projectId]/attachments/route"),
    prepare: async () => {
      const form = new FormData();
      form.set("purpose", "fire-report");
      form.set("file", new File([TINY_PDF], "report.pdf", { type: "application/pdf" }));
      return { params: { projectId }, form };
    },
    expected: projectRule("design.edit", 201),
  },
  {
    key: "GET /api/v1/projects/[projectId]/attachments/[attachmentId]",
    method: "GET",
    writes: false,
    load: () => import("@/app/api/v1/projects/[projectId]/attachments/[attachmentId]/route"),
    prepare: async () => ({ params: { projectId, attachmentId: makeAttachment(projectId).id } }),
    expected: projectRule("design.view", 200),
  },
  {
    key: "GET /api/v1/projects/[projectId]/rooms",
    method: "GET",
    writes: false,
    load: () => import("@/app/api/v1/projects/[projectId]/rooms/route"),
    prepare: async () => ({ params: { projectId } }),
    expected: projectRule("design.view", 200),
  },
  {
    key: "POST /api/v1/projects/[projectId]/rooms",
    method: "POST",
    writes: true,
    load: () => import("@/app/api/v1/projects/[projectId]/rooms/route"),
    prepare: async () => ({ params: { projectId }, body: walkRoom() }),
    expected: projectRule("design.edit", 201),
  },
  {
    key: "GET /api/v1/projects/[projectId]/rooms/[roomId]",
    method: "GET",
    writes: false,
    load: () => import("@/app/api/v1/projects/[projectId]/rooms/[roomId]/route"),
    prepare: async () => ({ params: { projectId, roomId: await freshRoom() } }),
    expected: projectRule("design.view", 200),
  },
  {
    key: "PUT /api/v1/projects/[projectId]/rooms/[roomId]",
    method: "PUT",
    writes: true,
    load: () => import("@/app/api/v1/projects/[projectId]/rooms/[roomId]/route"),
    prepare: async () => ({ params: { projectId, roomId: await freshRoom() }, body: { ...walkRoom(), name: "Renamed", version: 1 } }),
    expected: projectRule("design.edit", 200),
  },
  {
    key: "DELETE /api/v1/projects/[projectId]/rooms/[roomId]",
    method: "DELETE",
    writes: true,
    load: () => import("@/app/api/v1/projects/[projectId]/rooms/[roomId]/route"),
    prepare: async () => ({ params: { projectId, roomId: await freshRoom() } }),
    expected: projectRule("design.edit", 200),
  },
  {
    key: "GET /api/v1/projects/[projectId]/materials",
    method: "GET",
    writes: false,
    load: () => import("@/app/api/v1/projects/[projectId]/materials/route"),
    prepare: async () => ({ params: { projectId } }),
    expected: projectRule("design.view", 200),
  },
  {
    key: "POST /api/v1/projects/[projectId]/materials",
    method: "POST",
    writes: true,
    load: () => import("@/app/api/v1/projects/[projectId]/materials/route"),
    prepare: async () => ({
      params: { projectId },
      body: { name: "Walk material", alpha: { "125": 0.1, "250": 0.2, "500": 0.3, "1000": 0.4, "2000": 0.5, "4000": 0.6 }, source: "walk test values (invented)" },
    }),
    expected: projectRule("design.edit", 201),
  },
  {
    key: "GET /api/v1/projects/[projectId]/rooms/[roomId]/boards/[surfaceKey]",
    method: "GET",
    writes: false,
    load: () => import("@/app/api/v1/projects/[projectId]/rooms/[roomId]/boards/[surfaceKey]/route"),
    prepare: async () => ({ params: { projectId, roomId: await freshRoom(), surfaceKey: "wall-a" } }),
    expected: projectRule("design.view", 200),
  },
  {
    key: "PUT /api/v1/projects/[projectId]/rooms/[roomId]/boards/[surfaceKey]",
    method: "PUT",
    writes: true,
    load: () => import("@/app/api/v1/projects/[projectId]/rooms/[roomId]/boards/[surfaceKey]/route"),
    prepare: async () => ({
      params: { projectId, roomId: await freshRoom(), surfaceKey: "wall-a" },
      body: { version: 0, placements: [{ id: "p1", buildUpId: makeBuildUp(projectId).id, code: "P-001", x: 0.1, y: 0.1, width: 0.6, height: 1.2 }] },
    }),
    expected: projectRule("design.edit", 200),
  },
  {
    key: "PUT /api/v1/projects/[projectId]/rooms/[roomId]/boards/[surfaceKey]/drawing",
    method: "PUT",
    writes: true,
    load: () => import("@/app/api/v1/projects/[projectId]/rooms/[roomId]/boards/[surfaceKey]/drawing/route"),
    prepare: async () => ({ params: { projectId, roomId: await freshRoom(), surfaceKey: "wall-a" }, body: { attachmentId: makeAttachment(projectId, "drawing").id, metresPerPixel: 0.01 } }),
    expected: projectRule("drawing.upload", 200),
  },
  {
    key: "POST /api/v1/projects/[projectId]/rooms/[roomId]/boards/[surfaceKey]/pins",
    method: "POST",
    writes: true,
    load: () => import("@/app/api/v1/projects/[projectId]/rooms/[roomId]/boards/[surfaceKey]/pins/route"),
    prepare: async () => ({ params: { projectId, roomId: await freshRoom(), surfaceKey: "wall-a" }, body: { x: 1, y: 1, body: "Walk pin" } }),
    expected: projectRule("pin.write", 201),
  },
  {
    key: "POST /api/v1/projects/[projectId]/pins/[pinId]/replies",
    method: "POST",
    writes: true,
    load: () => import("@/app/api/v1/projects/[projectId]/pins/[pinId]/replies/route"),
    prepare: async () => ({ params: { projectId, pinId: await freshPin() }, body: { body: "Walk reply" } }),
    expected: projectRule("pin.write", 201),
  },
  {
    key: "POST /api/v1/projects/[projectId]/pins/[pinId]/resolve",
    method: "POST",
    writes: true,
    load: () => import("@/app/api/v1/projects/[projectId]/pins/[pinId]/resolve/route"),
    prepare: async () => ({ params: { projectId, pinId: await freshPin() }, body: { resolved: true } }),
    expected: projectRule("pin.resolve", 200),
  },
  {
    key: "PATCH /api/v1/projects/[projectId]/rooms/[roomId]",
    method: "PATCH",
    writes: true,
    load: () => import("@/app/api/v1/projects/[projectId]/rooms/[roomId]/route"),
    prepare: async () => ({ params: { projectId, roomId: await freshRoom() }, body: { fireRequired: "B-s1,d0" } }),
    expected: projectRule("design.edit", 200),
  },
  {
    key: "GET /api/v1/projects/[projectId]/rooms/[roomId]/readiness",
    method: "GET",
    writes: false,
    load: () => import("@/app/api/v1/projects/[projectId]/rooms/[roomId]/readiness/route"),
    prepare: async () => ({ params: { projectId, roomId: await freshRoom() } }),
    expected: projectRule("submittal.issue", 200),
  },
  {
    key: "GET /api/v1/projects/[projectId]/submittals",
    method: "GET",
    writes: false,
    load: () => import("@/app/api/v1/projects/[projectId]/submittals/route"),
    prepare: async () => ({ params: { projectId } }),
    expected: projectRule("submittal.viewIssued", 200),
  },
  {
    key: "POST /api/v1/projects/[projectId]/submittals",
    method: "POST",
    writes: true,
    load: () => import("@/app/api/v1/projects/[projectId]/submittals/route"),
    prepare: async () => {
      const { roomId } = await designedRoom(cookies.consultant, projectId, { panels: 1 });
      const { issueReadiness } = await import("@/lib/services/submittals");
      const { letter, items } = issueReadiness(await actorOf(cookies.consultant), projectId, roomId);
      return { params: { projectId }, body: { roomId, letter, confirm: items.map((i) => i.key) } };
    },
    expected: projectRule("submittal.issue", 201),
  },
  ...(["", "/pdf", "/decision-record"] as const).map(
    (sub): Endpoint => ({
      key: `GET /api/v1/projects/[projectId]/submittals/[submittalId]${sub}`,
      method: "GET",
      writes: false,
      load: () =>
        sub === "" ? import("@/app/api/v1/projects/[projectId]/submittals/[submittalId]/route") : sub === "/pdf" ? import("@/app/api/v1/projects/[projectId]/submittals/[submittalId]/pdf/route") : import("@/app/api/v1/projects/[projectId]/submittals/[submittalId]/decision-record/route"),
      prepare: async () => ({ params: { projectId, submittalId: (await approvedRevision()).id } }),
      // An approved revision: every member may open it and its documents.
      expected: projectRule("submittal.viewIssued", 200),
    }),
  ),
  {
    key: "POST /api/v1/projects/[projectId]/submittals/[submittalId]/decision",
    method: "POST",
    writes: true,
    load: () => import("@/app/api/v1/projects/[projectId]/submittals/[submittalId]/decision/route"),
    prepare: async () => {
      const issued = await issuedRevision();
      return { params: { projectId, submittalId: issued.id }, body: { outcome: "approved", signature: clientName, notes: "", pdfSha256: await pdfHashOf(cookies.consultant, projectId, issued.id) } };
    },
    expected: projectRule("submittal.decide", 200),
  },
  {
    key: "GET /api/v1/projects/[projectId]/submittals/[submittalId]/shop-pack",
    method: "GET",
    writes: false,
    load: () => import("@/app/api/v1/projects/[projectId]/submittals/[submittalId]/shop-pack/route"),
    prepare: async () => ({ params: { projectId, submittalId: (await approvedRevision()).id } }),
    expected: projectRule("shop.download", 200),
  },
  {
    key: "PUT /api/v1/projects/[projectId]/submittals/[submittalId]/placements/[placementId]",
    method: "PUT",
    writes: true,
    load: () => import("@/app/api/v1/projects/[projectId]/submittals/[submittalId]/placements/[placementId]/route"),
    prepare: async () => ({ params: await approvedPanel(), body: { installed: true } }),
    expected: projectRule("install.record", 200),
  },
  {
    key: "POST /api/v1/projects/[projectId]/submittals/[submittalId]/placements/[placementId]/photo",
    method: "POST",
    writes: true,
    load: () => import("@/app/api/v1/projects/[projectId]/submittals/[submittalId]/placements/[placementId]/photo/route"),
    prepare: async () => {
      const form = new FormData();
      form.set("file", new File([await photoWithLocation()], "site.jpg", { type: "image/jpeg" }));
      return { params: await approvedPanel(), form };
    },
    expected: projectRule("install.record", 201),
  },
  {
    key: "GET /api/v1/projects/[projectId]/progress",
    method: "GET",
    writes: false,
    load: () => import("@/app/api/v1/projects/[projectId]/progress/route"),
    prepare: async () => ({ params: { projectId } }),
    expected: projectRule("project.view", 200),
  },
  { key: "GET /api/health", method: "GET", writes: false, load: () => import("@/app/api/health/route"), expected: () => 200 },
  { key: "GET /api/v1/firm/accounts", method: "GET", writes: false, load: () => import("@/app/api/v1/firm/accounts/route"), expected: (who) => (who === "none" ? 401 : who === "admin" ? 200 : 403) },
  {
    key: "POST /api/v1/firm/invitations",
    method: "POST",
    writes: true,
    load: () => import("@/app/api/v1/firm/invitations/route"),
    prepare: async () => ({ body: { email: uniqueEmail("colleague") } }),
    expected: (who) => (who === "none" ? 401 : who === "admin" ? 201 : 403),
  },
  {
    key: "PATCH /api/v1/firm/accounts/[userId]",
    method: "PATCH",
    writes: true,
    load: () => import("@/app/api/v1/firm/accounts/[userId]/route"),
    prepare: async () => ({ params: { userId: (await makeUser({ firmId })).id }, body: { disabled: true } }),
    // Only the firm administrator; members of no consultancy are refused the same way.
    expected: (who) => (who === "none" ? 401 : who === "admin" ? 200 : 403),
  },
  {
    key: "DELETE /api/v1/projects/[projectId]/members/[userId]",
    method: "DELETE",
    writes: true,
    load: () => import("@/app/api/v1/projects/[projectId]/members/[userId]/route"),
    prepare: async () => {
      const member = await makeUser();
      addMember(projectId, member.id, "client");
      return { params: { projectId, userId: member.id } };
    },
    expected: projectRule("team.remove", 200),
  },
  {
    key: "POST /api/v1/invitations/[token]/account",
    method: "POST",
    writes: true,
    load: () => import("@/app/api/v1/invitations/[token]/account/route"),
    prepare: async () => ({ params: { token: (await freshInvitation()).token }, body: { name: "Walk newcomer (fictional)", password: WALK_PASSWORD, confirm: WALK_PASSWORD } }),
    // The token is the proof: whoever holds it (signed in or not) creates the invited account.
    expected: () => 201,
  },
  {
    key: "POST /api/v1/password-reset",
    method: "POST",
    writes: true,
    load: () => import("@/app/api/v1/password-reset/route"),
    prepare: async () => ({ body: { email: (await makeUser()).email } }),
    expected: () => 200,
  },
  {
    key: "POST /api/v1/password-reset/[token]",
    method: "POST",
    writes: true,
    load: () => import("@/app/api/v1/password-reset/[token]/route"),
    prepare: async () => ({ params: { token: await freshResetToken() }, body: { password: WALK_PASSWORD, confirm: WALK_PASSWORD } }),
    // The e-mailed token is the proof, whoever sends it.
    expected: () => 200,
  },
  {
    key: "POST /api/v1/me/password",
    method: "POST",
    writes: true,
    load: () => import("@/app/api/v1/me/password/route"),
    prepare: async () => ({ body: { currentPassword: TEST_PASSWORD, password: WALK_PASSWORD, confirm: WALK_PASSWORD } }),
    expected: signedIn(200),
    restore: async (who) => {
      if (who !== "none") await setPassword(emails[who], TEST_PASSWORD);
    },
  },
  { key: "GET /api/v1/me/sessions", method: "GET", writes: false, load: () => import("@/app/api/v1/me/sessions/route"), expected: signedIn(200) },
  {
    key: "DELETE /api/v1/me/sessions/[sessionId]",
    method: "DELETE",
    writes: true,
    load: () => import("@/app/api/v1/me/sessions/[sessionId]/route"),
    // A second session of the actor's own (for no session: the consultant's, which is refused).
    prepare: async (who) => ({ params: { sessionId: await secondSessionOf(who === "none" ? "consultant" : who) } }),
    expected: signedIn(200),
  },
  {
    key: "DELETE /api/v1/me/sessions",
    method: "DELETE",
    writes: true,
    load: () => import("@/app/api/v1/me/sessions/route"),
    expected: signedIn(200),
    restore: async (who) => {
      if (who !== "none") cookies[who] = await signIn(emails[who]);
    },
  },
];

const WALK_PASSWORD = "walk-password-456";

async function setPassword(email: string, password: string) {
  const { hashPassword } = await import("better-auth/crypto");
  const { account, user } = await import("@/db/schema");
  const { eq } = await import("drizzle-orm");
  const u = getDb().select().from(user).where(eq(user.email, email)).get()!;
  getDb().update(account).set({ password: await hashPassword(password) }).where(eq(account.userId, u.id)).run();
}

async function secondSessionOf(who: Exclude<Who, "none">): Promise<string> {
  const { session, user } = await import("@/db/schema");
  const { eq } = await import("drizzle-orm");
  const cookie = await signIn(emails[who]);
  const { actorFromHeaders } = await import("@/lib/auth/session");
  const actor = await actorFromHeaders(new Headers({ cookie }));
  const u = getDb().select().from(user).where(eq(user.email, emails[who])).get()!;
  expect(getDb().select().from(session).where(eq(session.userId, u.id)).all().length).toBeGreaterThan(1);
  return actor!.sessionId!;
}

async function freshResetToken(): Promise<string> {
  const u = await makeUser();
  const { requestPasswordReset } = await import("@/lib/services/password");
  await requestPasswordReset(null, { email: u.email }, `walk-${u.id}`);
  const [mail] = await waitForMail(envHandle.mail, u.email);
  return tokenIn(mail.text, "/reset-password");
}

// Submittal revisions for the routes that act on one: a fresh issued revision per call (a
// decision is final), and one approved revision shared by the routes that only read or record.
let clientName = "";
async function issuedRevision() {
  const { roomId } = await designedRoom(cookies.consultant, projectId, { panels: 2 });
  return issueConfirmed(cookies.consultant, projectId, roomId);
}

let approved: Promise<{ id: string }> | null = null;
function approvedRevision() {
  approved ??= (async () => {
    const issued = await issuedRevision();
    const { decideSubmittal } = await import("@/lib/services/submittals");
    await decideSubmittal(await actorOf(cookies.client), projectId, issued.id, { outcome: "approved", signature: clientName, pdfSha256: await pdfHashOf(cookies.consultant, projectId, issued.id) });
    return issued;
  })();
  return approved;
}

async function approvedPanel() {
  const { id } = await approvedRevision();
  const { getSubmittal } = await import("@/lib/services/submittals");
  return { projectId, submittalId: id, placementId: getSubmittal(await actorOf(cookies.consultant), projectId, id).install!.placements[0].id };
}

function buildUpBody() {
  return { name: "Walk build-up", spec: SPEC, moduleWidth: 0.6, moduleHeight: 1.2, borderX: 0.03, borderY: 0.03 };
}

describe("role walk", () => {
  it("lists every route handler under app/api", () => {
    const listed = ENDPOINTS.map((e) => e.key).concat(EXTRA_KEYS).sort();
    expect(listed).toEqual(routeFiles().map((f) => f.key).sort());
  });

  for (const endpoint of ENDPOINTS) {
    describe(endpoint.key, () => {
      for (const who of EVERYONE) {
        const status = endpoint.expected(who);
        it(`${who} → ${status}`, async () => {
          const mod = await endpoint.load();
          const prep = (await endpoint.prepare?.(who)) ?? {};
          const before = tableCounts();
          const res = await call(mod[endpoint.method], {
            method: endpoint.method,
            cookie: who === "none" ? null : cookies[who],
            params: prep.params,
            body: prep.body,
            form: prep.form,
          });
          expect(res.status, JSON.stringify(res.json)).toBe(status);
          if (status >= 400) {
            expect(res.json.error.message).toBeTruthy();
            // A guard that refuses writes nothing.
            if (endpoint.writes) expect(tableCounts()).toEqual(before);
          }
          await endpoint.restore?.(who);
        });
      }
    });
  }
});

// Routes of later capabilities register their own role walks; their keys are listed here.
import { EXTRA_KEYS } from "../support/extra-route-keys";

// Without a hand edit, every handler on disk (a later change's too) refuses a request without a
// session and a signed-in outsider's, and writes nothing for either. Only these answer anyone.
const PUBLIC = new Set([
  "GET /api/health",
  "GET /api/v1/invitations/[token]",
  // The e-mailed token is the proof for these, not a session.
  "POST /api/v1/invitations/[token]/account",
  "POST /api/v1/password-reset",
  "POST /api/v1/password-reset/[token]",
]);

describe("every handler on disk, found by reading app/api", () => {
  for (const file of routeFiles()) {
    const changes = file.method !== "GET";
    it(`${file.key}: no session → ${PUBLIC.has(file.key) ? "answered" : "401"}, nothing written`, async () => {
      const handler = (await file.load())[file.method] as Parameters<typeof call>[0];
      const params = await paramsFor(file, world);
      const before = tableCounts();
      const res = await call(handler, { method: file.method, params, path: pathFor(file.route, params), body: changes ? {} : undefined });
      if (PUBLIC.has(file.key)) expect(res.status).toBeLessThan(500);
      else expect(res.status, JSON.stringify(res.json)).toBe(401);
      if (changes) expect(tableCounts()).toEqual(before);
    });
    if (!file.params.includes("projectId")) continue;
    it(`${file.key}: a signed-in outsider is refused, nothing written`, async () => {
      const handler = (await file.load())[file.method] as Parameters<typeof call>[0];
      const params = await paramsFor(file, world);
      const before = tableCounts();
      const res = await call(handler, { method: file.method, cookie: cookies.outsider, params, path: pathFor(file.route, params), body: changes ? {} : undefined });
      // A project the outsider is not in does not exist for them (404); a body they may not
      // send at all can be refused before that (415 for JSON to an upload).
      if (changes) expect([403, 404, 415]).toContain(res.status);
      else expect(res.status).toBe(404);
      expect(tableCounts()).toEqual(before);
    });
  }
});
