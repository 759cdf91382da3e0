import type { SubmittalState } from "@/db/schema/submittal";

// A revision's state in plain words: sage once approved, amber when returned, faint when it no
// longer counts; red is kept for failures.
const STYLE: Record<SubmittalState, string> = {
  draft: "border-dashed border-ink/40 text-ink-soft bg-white/60",
  issued: "border-ink text-ink bg-white",
  approved: "border-sage text-sage bg-sage-soft/60",
  "approved-as-noted": "border-sage text-sage bg-sage-soft/60",
  returned: "border-caution text-ink bg-caution-soft/70",
  superseded: "border-ink/25 text-ink-faint bg-paper-deep/60",
};

export const STATE_LABEL: Record<SubmittalState, string> = {
  draft: "draft",
  issued: "issued, awaiting decision",
  approved: "approved",
  "approved-as-noted": "approved as noted",
  returned: "returned for revision",
  superseded: "superseded",
};

export function StateBadge({ state }: { state: SubmittalState }) {
  return (
    <span data-state={state} className={`inline-block whitespace-nowrap rounded-sheet border px-1.5 py-0.5 text-[11px] font-semibold ${STYLE[state]}`}>
      {STATE_LABEL[state]}
    </span>
  );
}
