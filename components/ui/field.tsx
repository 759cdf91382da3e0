import type { InputHTMLAttributes, ReactNode, SelectHTMLAttributes } from "react";

type Common = { label: string; name: string; error?: string; hint?: ReactNode };

function FieldLabel({ id, label }: { id: string; label: string }) {
  return (
    <label htmlFor={id} className="text-xs font-semibold uppercase tracking-wider text-ink-soft">
      {label}
    </label>
  );
}

function FieldNote({ id, error, hint }: { id: string; error?: string; hint?: ReactNode }) {
  if (error) {
    return (
      <p id={`${id}-error`} role="alert" className="text-xs font-medium text-fault">
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
    <div className={`flex flex-col gap-1 ${className}`}>
      <FieldLabel id={id} label={label} />
      <select
        id={id}
        name={name}
        aria-invalid={error ? true : undefined}
        {...rest}
        className={`rounded-sheet border bg-white/70 px-3 py-2 text-sm text-ink focus:border-copper focus:outline-none ${error ? "border-fault" : "border-paper-edge"}`}
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
