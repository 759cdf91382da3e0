// A band's standing against its target: amber and red only where something is wrong.
const STYLE: Record<string, string> = {
  within: "border-sage text-sage bg-sage-soft/60",
  over: "border-fault text-fault bg-fault-soft/60",
  under: "border-caution text-ink bg-caution-soft/70",
  "no target": "border-ink/30 text-ink-faint bg-white/60",
  "no data": "border-ink/30 text-ink-faint bg-white/60",
};
const WORDS: Record<string, string> = { within: "within", over: "too long", under: "too short", "no target": "no target", "no data": "no data" };

export function StatusBadge({ status }: { status: string }) {
  return (
    <span data-status={status} className={`inline-block rounded-sheet border px-1.5 py-0.5 text-[11px] font-semibold ${STYLE[status] ?? STYLE["no data"]}`}>
      {WORDS[status] ?? status}
    </span>
  );
}
