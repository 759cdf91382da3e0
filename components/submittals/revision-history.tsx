import type { HistoryLine } from "@/lib/services/submittals";
import { formatInstant } from "@/lib/documents/format";
import { Sheet } from "@/components/ui/sheet";

export function RevisionHistory({ lines }: { lines: HistoryLine[] }) {
  return (
    <Sheet title="History">
      {lines.length === 0 ? (
        <p className="text-sm text-ink-soft">Nothing has happened to this revision yet.</p>
      ) : (
        <ol className="flex flex-col gap-2 text-sm" data-testid="history">
          {lines.map((h, i) => (
            <li key={`${h.at}-${i}`} className="border-l-2 border-ink/20 pl-3">
              <p className="text-xs text-ink-soft">
                {formatInstant(h.at)}
                {h.who ? ` · ${h.who}` : ""}
              </p>
              <p className="break-words">{h.what}</p>
            </li>
          ))}
        </ol>
      )}
    </Sheet>
  );
}
