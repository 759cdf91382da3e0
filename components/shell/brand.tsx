import Link from "next/link";

export function Brand({ href = "/projects" }: { href?: string }) {
  return (
    <Link href={href} className="group flex items-center gap-2.5" aria-label="Cavitas home">
      <svg viewBox="0 0 32 32" className="h-7 w-7" aria-hidden>
        <rect width="32" height="32" rx="4" fill="#1a2740" />
        <rect x="5" y="7" width="3" height="18" fill="#f6f2e9" />
        <circle cx="6.5" cy="11" r="0.9" fill="#1a2740" />
        <circle cx="6.5" cy="16" r="0.9" fill="#1a2740" />
        <circle cx="6.5" cy="21" r="0.9" fill="#1a2740" />
        <path d="M11 16 C 15 6, 19 6, 21 16 S 26 26, 28 16" fill="none" stroke="#d98a55" strokeWidth="2.2" strokeLinecap="round" />
      </svg>
      <span className="text-lg font-semibold tracking-tight text-ink">Cavitas</span>
    </Link>
  );
}
