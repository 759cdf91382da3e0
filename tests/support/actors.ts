import { signIn } from "./http";

// The Actor a service would see for a signed-in person (for setting up data through services).
export async function actorOf(cookieOrEmail: string) {
  const { actorFromHeaders } = await import("@/lib/auth/session");
  const cookie = cookieOrEmail.includes("=") ? cookieOrEmail : await signIn(cookieOrEmail);
  return (await actorFromHeaders(new Headers({ cookie })))!;
}

/** A room with its surfaces and a review pin on wall A, written by the given member. */
export async function pinBy(consultantCookie: string, authorCookie: string, projectId: string, body: string) {
  const { createRoom } = await import("@/lib/services/rooms");
  const { createPin } = await import("@/lib/services/boards");
  const room = createRoom(await actorOf(consultantCookie), projectId, { name: "Pin room", use: "speech", shape: "shoebox", length: 8, width: 6, height: 3 });
  await createPin(await actorOf(authorCookie), projectId, room.id, "wall-a", { x: 1, y: 1, body });
  return room.id;
}

export async function pinAuthors(cookie: string, projectId: string, roomId: string) {
  const { getBoard } = await import("@/lib/services/boards");
  return getBoard(await actorOf(cookie), projectId, roomId, "wall-a").pins.map((p) => ({ body: p.body, author: p.author.name }));
}
