import type { RuleBreak } from "@/lib/board/rules";

const WORDS: Record<RuleBreak["rule"], string> = { outside: "outside", "over-opening": "over an opening", overlap: "overlap", clearance: "clearance" };

// Broken rules, red where the panel cannot be built as drawn, amber where it misses the
// project's clearance. Clicking one selects its panels.
export function RulesList({ breaks, onPick }: { breaks: RuleBreak[]; onPick: (ids: string[]) => void }) {
  if (breaks.length === 0) return <p className="text-xs text-sage" data-testid="rules-clear">Every panel keeps the rules.</p>;
  return (
    <ul className="flex max-h-64 flex-col gap-1 overflow-y-auto" data-testid="rules">
      {breaks.map((b, i) => (
        <li key={`${b.rule}-${b.placementIds.join("-")}-${i}`}>
          <button
            type="button"
            onClick={() => onPick(b.placementIds)}
            data-rule={b.rule}
            className={`w-full rounded-sheet border-l-4 px-2 py-1 text-left text-xs hover:bg-white ${b.severity === "error" ? "border-fault bg-fault-soft/50" : "border-caution bg-caution-soft/50"}`}
          >
            <span className="font-semibold">{WORDS[b.rule]}: </span>
            {b.message}
          </button>
        </li>
      ))}
    </ul>
  );
}
