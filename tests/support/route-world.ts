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
