import type { MaterialView } from "@/lib/services/materials";
import { FIELD_LABEL, FieldNote } from "@/components/ui/field";

// Finishes grouped: the project's own first, then the built-in library, its published values
// (book and table) apart from the few recalled from memory; the chosen finish's source shows
// under the field, so a consultant sees where a number comes from before relying on it.
type Props = { id: string; value: string; onChange: (key: string) => void; materials: MaterialView[]; error?: string; label: string; showLabel?: boolean };

export function MaterialSelect({ id, value, onChange, materials, error, label, showLabel = false }: Props) {
  const own = materials.filter((m) => m.own);
  const published = materials.filter((m) => !m.own && m.provenance !== "from memory");
  const recalled = materials.filter((m) => !m.own && m.provenance === "from memory");
  const chosen = materials.find((m) => m.key === value);
  return (
    <div className="flex min-w-0 flex-col gap-1">
      <label htmlFor={id} className={showLabel ? FIELD_LABEL : "sr-only"}>
        {label}
      </label>
      <select
        id={id}
        value={value}
        aria-invalid={error ? true : undefined}
        aria-describedby={[error ? `${id}-error` : "", chosen ? `${id}-source` : ""].filter(Boolean).join(" ") || undefined}
        title={chosen?.name}
        onChange={(e) => onChange(e.target.value)}
        className={`w-full rounded-sheet border bg-white/70 px-2 py-1.5 text-xs ${error ? "border-fault" : "border-paper-edge"}`}
      >
        {!chosen && <option value={value}>{value} (unknown)</option>}
        {own.length > 0 && (
          <optgroup label="This project's materials">
            {own.map((m) => (
              <option key={m.key} value={m.key}>
                {m.name}
              </option>
            ))}
          </optgroup>
        )}
        <optgroup label="Library: published values">
          {published.map((m) => (
            <option key={m.key} value={m.key}>
              {m.name}
            </option>
          ))}
        </optgroup>
        {recalled.length > 0 && (
          <optgroup label="Library: no published value found (from memory)">
            {recalled.map((m) => (
              <option key={m.key} value={m.key}>
                {m.name} (from memory)
              </option>
            ))}
          </optgroup>
        )}
      </select>
      {chosen && (
        <p id={`${id}-source`} title={chosen.source} className={`truncate text-[10px] ${chosen.provenance === "from memory" ? "text-caution-deep" : "text-ink-faint"}`} data-testid="finish-source">
          {chosen.short}
        </p>
      )}
      <FieldNote id={id} error={error} small />
    </div>
  );
}
