import type { ReactNode } from "react";
import { Brand } from "@/components/shell/brand";
import { SheetArt } from "@/components/auth/sheet-art";

export default function AuthLayout({ children }: { children: ReactNode }) {
  return (
    <div className="grid min-h-screen lg:grid-cols-[1.1fr_1fr]">
      <aside className="hidden flex-col justify-between border-r border-ink/20 bg-ink px-12 py-10 text-paper lg:flex">
        <p className="text-xs font-semibold uppercase tracking-[0.22em] text-copper-soft">Resonant absorbers, specified</p>
        <SheetArt />
        <p className="max-w-md text-sm leading-relaxed text-paper/75">
          Tune a perforated or slotted build-up to the band a room lacks, prove the reverberation time
          against its target, set the panels out on the elevations, and issue the submittal.
        </p>
      </aside>
      <main className="flex flex-col px-6 py-10 sm:px-12">
        <Brand href="/" />
        <div className="flex flex-1 items-center">
          <div className="w-full max-w-md">{children}</div>
        </div>
      </main>
    </div>
  );
}
