import Link from "next/link";
import type { Me } from "@/lib/services/settings";
import { Brand } from "./brand";
import { SignOutButton } from "./sign-out-button";

export function TopBar({ me }: { me: Me }) {
  return (
    <header className="border-b border-ink/20 bg-paper/90 backdrop-blur">
      <div className="mx-auto flex max-w-[1320px] items-center justify-between gap-6 px-6 py-3">
        <div className="flex items-center gap-8">
          <Brand />
          <nav className="flex items-center gap-5 text-sm" aria-label="Main">
            <Link href="/projects" className="text-ink-soft hover:text-ink">
              Projects
            </Link>
            {me.isFirmAdmin && (
              <Link href="/firm" className="text-ink-soft hover:text-ink">
                Firm accounts
              </Link>
            )}
            <Link href="/settings" className="text-ink-soft hover:text-ink">
              Settings
            </Link>
          </nav>
        </div>
        <div className="flex items-center gap-4 text-sm">
          <span className="hidden text-right sm:block">
            <span className="block font-medium text-ink" data-testid="signed-in-name">
              {me.name}
            </span>
            <span className="block text-xs text-ink-faint">
              {me.email} · {me.unitPreference === "metric" ? "metric" : "imperial"} units
            </span>
          </span>
          <SignOutButton />
        </div>
      </div>
    </header>
  );
}
