import type { ReactNode } from "react";

export type HeadCell = { label: ReactNode; numeric?: boolean };

// A table's heading row as the sheets draw it: small capitals over a ruled line, figures
// columns right-aligned.
export function TableHead({ cells, dense = false }: { cells: readonly HeadCell[]; dense?: boolean }) {
  return (
    <thead>
      <tr className="border-b border-ink/30 text-left text-xs uppercase tracking-wider text-ink-soft">
        {cells.map((c, i) => (
          <th key={i} className={`whitespace-nowrap ${dense ? "py-1.5" : "py-2"} font-semibold ${i < cells.length - 1 ? "pr-3" : ""} ${c.numeric ? "text-right" : ""}`}>
            {c.label}
          </th>
        ))}
      </tr>
    </thead>
  );
}
