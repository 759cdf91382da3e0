import type { MaterialView } from "@/lib/services/materials";

// Finishes grouped: the project's own first, then the built-in library (values marked
// "typical, from memory" where they were recalled rather than checked).
export function MaterialSelect({ id, value, onChange, materials, error, label }: { id: string; value: string; onChange: (key: string) => void; materials: MaterialView[]; error?: string; label: string }) {
  const own = materials.filter((m) => m.own);
  const library = materials.filter((m) => !m.own);
  const known = materials.some((m) => m.key === value);
  return (
    <div className="flex flex-col gap-0.5">
      <label htmlFor={id} className="sr-only">
        {label}
      </label>
      <select
        id={id}
        value={value}
        aria-invalid={error ? true : undefined}
        onChange={(e) => onChange(e.target.value)}
        className={`w-full rounded-sheet border bg-white/70 px-2 py-1 text-xs ${error ? "border-fault" : "border-paper-edge"}`}
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
      {error && (
        <p role="alert" className="text-[11px] font-medium text-fault">
          {error}
        </p>
      )}
    </div>
  );
}
