import type { MaterialView } from "@/lib/services/materials";
import { FIELD_LABEL, FieldNote } from "@/components/ui/field";

// Finishes grouped: the project's own first, then the built-in library (values marked
// "typical, from memory" where they were recalled rather than checked).
type Props = { id: string; value: string; onChange: (key: string) => void; materials: MaterialView[]; error?: string; label: string; showLabel?: boolean };

export function MaterialSelect({ id, value, onChange, materials, error, label, showLabel = false }: Props) {
  const own = materials.filter((m) => m.own);
  const library = materials.filter((m) => !m.own);
  const known = materials.some((m) => m.key === value);
  return (
    <div className="flex min-w-0 flex-col gap-1">
      <label htmlFor={id} className={showLabel ? FIELD_LABEL : "sr-only"}>
        {label}
      </label>
      <select
        id={id}
        value={value}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-error` : undefined}
        title={materials.find((m) => m.key === value)?.name}
        onChange={(e) => onChange(e.target.value)}
        className={`w-full rounded-sheet border bg-white/70 px-2 py-1.5 text-xs ${error ? "border-fault" : "border-paper-edge"}`}
      >
        {!known && <option value={value}>{value} (unknown)</option>}
        {own.length > 0 && (
          <optgroup label="This project's materials">
            {own.map((m) => (
              <option key={m.key} value={m.key}>
                {m.name}
              </option>
            ))}
          </optgroup>
        )}
        <optgroup label="Library (typical values, from memory)">
          {library.map((m) => (
            <option key={m.key} value={m.key}>
              {m.name}
            </option>
          ))}
        </optgroup>
      </select>
      <FieldNote id={id} error={error} small />
    </div>
  );
}
