import type { ReactNode } from "react";
import { TopBar } from "@/components/shell/top-bar";
import { requirePageActor } from "@/app/_lib/current-actor";
import { getMe } from "@/lib/services/settings";

export const dynamic = "force-dynamic";

export default async function WorkspaceLayout({ children }: { children: ReactNode }) {
  const actor = await requirePageActor();
  return (
    <>
      <TopBar me={getMe(actor)} />
      <main className="mx-auto max-w-[1320px] px-6 py-10">{children}</main>
    </>
  );
}
