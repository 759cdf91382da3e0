import type { MailCatcher } from "@/lib/mail/catcher";
import type { Actor } from "@/lib/services/actor";
import { makeAttachment, makeBuildUp, makeUser, uniqueEmail } from "./factories";
import type { RouteFile } from "./route-files";

// Fresh things for a route's path parameters, made by name, so a walk or a fuzz run can call
// any handler on disk. A later route with a parameter of a new name needs one line here; the
// walk says which name is missing.

export type RouteWorld = { projectId: string; consultant: Actor; architect: Actor; mail: MailCatcher };

export const walkRoom = () => ({ name: "Walk room", use: "speech", shape: "shoebox", length: 8, width: 6, height: 3 });

export async function freshRoom(w: RouteWorld): Promise<string> {
  const { createRoom } = await import("@/lib/services/rooms");
  return createRoom(w.consultant, w.projectId, walkRoom()).id;
}

export async function freshPin(w: RouteWorld): Promise<string> {
  const { createPin } = await import("@/lib/services/boards");
  return (await createPin(w.architect, w.projectId, await freshRoom(w), "wall-a", { x: 1, y: 1, body: "A pin to answer" })).id;
}

export async function freshInvitation(w: RouteWorld): Promise<{ id: string; token: string }> {
  const { inviteToProject } = await import("@/lib/services/invitations");
  const email = uniqueEmail("invitee");
  const { invitation } = await inviteToProject(w.consultant, w.projectId, { email, role: "architect" });
  const mail = w.mail.messages.find((m) => m.to.includes(email))!;
  const token = /\/invite\/([A-Za-z0-9_-]+)/.exec(mail.text)![1];
  return { id: invitation.id, token };
}

// One issued submittal revision per world (rendering its PDF takes a second), with a panel of
// it: the submittal routes' paths need both, and a walk or a fuzz run only needs them to exist.
const revisions = new WeakMap<RouteWorld, Promise<{ id: string; placementId: string }>>();
export function issuedRevision(w: RouteWorld): Promise<{ id: string; placementId: string }> {
  let made = revisions.get(w);
  if (!made) {
    made = (async () => {
      const { saveBoard } = await import("@/lib/services/boards");
      const { issueReadiness, issueSubmittal } = await import("@/lib/services/submittals");
      const roomId = await freshRoom(w);
      const placement = { id: "walk-panel", buildUpId: makeBuildUp(w.projectId).id, code: "P-001", x: 0.5, y: 0.5, width: 0.6, height: 1.2 };
      saveBoard(w.consultant, w.projectId, roomId, "wall-a", { version: 0, placements: [placement] });
      const { letter, items } = issueReadiness(w.consultant, w.projectId, roomId);
      const { id } = await issueSubmittal(w.consultant, w.projectId, { roomId, letter, confirm: items.map((i) => i.key) });
      const { getDb } = await import("@/db/client");
      const { submittal } = await import("@/db/schema");
      const { eq } = await import("drizzle-orm");
      const snapshot = JSON.parse(getDb().select().from(submittal).where(eq(submittal.id, id)).get()!.snapshot!) as { placements: { id: string }[] };
      return { id, placementId: snapshot.placements[0].id };
    })();
    revisions.set(w, made);
  }
  return made;
}

const MAKERS: Record<string, (w: RouteWorld) => Promise<string> | string> = {
  projectId: (w) => w.projectId,
  roomId: freshRoom,
  surfaceKey: () => "wall-a",
  buildUpId: (w) => makeBuildUp(w.projectId).id,
  attachmentId: (w) => makeAttachment(w.projectId).id,
  pinId: freshPin,
  invitationId: async (w) => (await freshInvitation(w)).id,
  token: async (w) => (await freshInvitation(w)).token,
  userId: async () => (await makeUser()).id,
  submittalId: async (w) => (await issuedRevision(w)).id,
  placementId: async (w) => (await issuedRevision(w)).placementId,
  // Another person's session id: never one of the caller's own, so refusal is what is tested.
  sessionId: () => "no-such-session",
};

export async function paramsFor(file: RouteFile, w: RouteWorld): Promise<Record<string, string>> {
  const out: Record<string, string> = {};
  for (const name of file.params) {
    const make = MAKERS[name];
    if (!make) throw new Error(`${file.key}: no fixture for the path parameter [${name}]; add one to tests/support/route-world.ts`);
    out[name] = await make(w);
  }
  return out;
}
