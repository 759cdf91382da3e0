import { redirect } from "next/navigation";
import { currentActor } from "@/app/_lib/current-actor";

export const dynamic = "force-dynamic";

export default async function Home() {
  redirect((await currentActor()) ? "/projects" : "/sign-in");
}
