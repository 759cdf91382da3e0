// Framework glue for server pages (Next.js headers and redirects); kept in app/, since lib/
// holds no framework code.
import { headers } from "next/headers";
import { redirect } from "next/navigation";
import { actorFromHeaders } from "@/lib/auth/session";
import type { Actor } from "@/lib/services/actor";

// For server components: the actor of the current request, or a redirect to sign-in.
export async function currentActor(): Promise<Actor | null> {
  return actorFromHeaders(await headers());
}

export async function requirePageActor(): Promise<Actor> {
  const actor = await currentActor();
  if (!actor) redirect("/sign-in");
  return actor;
}
