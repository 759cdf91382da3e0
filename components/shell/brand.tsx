import Link from "next/link";

export function Brand({ href = "/projects" }: { href?: string }) {
  return (
    <Link href={href} className="group flex items-center gap-2.5" aria-label="Cavitas home">
      {/* The mark is the app's icon, served from public/ (one drawing for the tab, the manifest and here). */}
      {/* eslint-disable-next-line @next/next/no-img-element -- a 28 px SVG needs no image optimisation */}
      <img src="/icon.svg" alt="" width={28} height={28} className="h-7 w-7" />
      <span className="text-lg font-semibold tracking-tight text-ink">Cavitas</span>
    </Link>
  );
}
