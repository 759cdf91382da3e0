import type { InputHTMLAttributes, ReactNode, SelectHTMLAttributes } from "react";

type Common = { label: string; name: string; error?: string; hint?: ReactNode };

// Labels keep their case: units such as Pa·s/m² or ft³ must read as written.
export const FIELD_LABEL = "text-xs font-semibold tracking-wide text-ink-soft";

function FieldLabel({ id, label }: { id: string; label: string }) {
  return (
    <label htmlFor={id} className={FIELD_LABEL}>
      {label}
    </label>
  );
}

/** A field's refusal (announced to assistive technology) or its hint. */
export function FieldNote({ id, error, hint, small = false }: { id: string; error?: string | null; hint?: ReactNode; small?: boolean }) {
  if (error) {
    return (
      <p id={`${id}-error`} role="alert" className={`${small ? "text-[11px]" : "text-xs"} font-medium text-fault`}>
        {error}
      </p>
    );
  }
  return hint ? <p className="text-xs text-ink-faint">{hint}</p> : null;
}

// A labelled input whose error is shown at the field and announced to assistive tech.
export function TextField({ label, name, error, hint, className = "", ...rest }: Common & InputHTMLAttributes<HTMLInputElement>) {
  const id = rest.id ?? `f-${name}`;
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <FieldLabel id={id} label={label} />
      <input
        id={id}
        name={name}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-error` : undefined}
        {...rest}
        className={`rounded-sheet border bg-white/70 px-3 py-2 text-sm text-ink placeholder:text-ink-faint focus:border-copper focus:outline-none ${error ? "border-fault" : "border-paper-edge"}`}
      />
      <FieldNote id={id} error={error} hint={hint} />
    </div>
  );
}

export function SelectField({
  label,
  name,
  error,
  hint,
  options,
  className = "",
  ...rest
}: Common & SelectHTMLAttributes<HTMLSelectElement> & { options: { value: string; label: string }[] }) {
  const id = rest.id ?? `f-${name}`;
  return (
    <div className={`flex min-w-0 flex-col gap-1 ${className}`}>
      <FieldLabel id={id} label={label} />
      <select
        id={id}
        name={name}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-error` : undefined}
        {...rest}
        className={`w-full rounded-sheet border bg-white/70 px-3 py-2 text-sm text-ink focus:border-copper focus:outline-none ${error ? "border-fault" : "border-paper-edge"}`}
      >
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
      <FieldNote id={id} error={error} hint={hint} />
    </div>
  );
}
