import type { ReactNode } from "react";

// A panel drawn like a drawing sheet: a ruled frame with a small title strip.
export function Sheet({ title, aside, children, className = "" }: { title?: ReactNode; aside?: ReactNode; children: ReactNode; className?: string }) {
  return (
    <section className={`rounded-sheet border border-ink/25 bg-white/60 shadow-[0_1px_0_rgba(26,39,64,0.06)] ${className}`}>
      {title && (
        <header className="flex items-center justify-between gap-4 border-b border-ink/15 px-5 py-3">
          <h2 className="text-sm font-semibold uppercase tracking-[0.12em] text-ink">{title}</h2>
          {aside}
        </header>
      )}
      <div className="px-5 py-4">{children}</div>
    </section>
  );
}

// The page heading: a title block with a reference line, as on a drawing.
export function TitleBlock({ kicker, title, meta, actions }: { kicker?: ReactNode; title: ReactNode; meta?: ReactNode; actions?: ReactNode }) {
  return (
    <div className="mb-8 flex flex-wrap items-end justify-between gap-4 border-b-2 border-ink pb-4">
      <div>
        {kicker && <p className="mb-1 text-xs font-semibold uppercase tracking-[0.18em] text-copper-deep">{kicker}</p>}
        <h1 className="text-2xl font-semibold">{title}</h1>
        {meta && <div className="mt-1 text-sm text-ink-soft">{meta}</div>}
      </div>
      {actions}
    </div>
  );
}
