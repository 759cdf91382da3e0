"use client";

import Link from "next/link";
import { usePathname } from "next/navigation";

type Item = { href: string; label: string };

// The project's own tabs, drawn as a ruled strip under the top bar.
export function ProjectNav({ projectId, projectName, show }: { projectId: string; projectName: string; show: { design: boolean; submittals: boolean; shopPack: boolean } }) {
  const path = usePathname();
  const base = `/projects/${projectId}`;
  const items: Item[] = [
    { href: base, label: "Overview" },
    ...(show.design
      ? [
          { href: `${base}/rooms`, label: "Rooms" },
          { href: `${base}/build-ups`, label: "Build-ups" },
        ]
      : []),
    ...(show.submittals ? [{ href: `${base}/submittals`, label: "Submittals" }] : []),
    ...(show.shopPack ? [{ href: `${base}/shop-pack`, label: "Shop pack" }] : []),
  ];
  const active = (href: string) => (href === base ? path === base : path.startsWith(href));
  return (
    <nav aria-label="Project" className="-mt-4 mb-8 flex items-center gap-1 border-b border-ink/20 text-sm">
      <span className="mr-4 max-w-[18rem] truncate py-2 text-xs uppercase tracking-[0.14em] text-ink-faint">{projectName}</span>
      {items.map((i) => (
        <Link
          key={i.href}
          href={i.href}
          aria-current={active(i.href) ? "page" : undefined}
          className={`-mb-px border-b-2 px-3 py-2 ${active(i.href) ? "border-copper font-medium text-ink" : "border-transparent text-ink-soft hover:text-ink"}`}
        >
          {i.label}
        </Link>
      ))}
    </nav>
  );
}
