"use client";

import { createContext, useCallback, useContext, useEffect, useId, useMemo, useRef, useState, type ReactNode } from "react";
import { Notice } from "./notice";

// A form knows which of its typed fields hold text that was refused, so it can refuse to
// submit while any does: what is sent is always what is on screen. Fields report themselves
// to the nearest scope; a form without one simply does not listen.

export type Refusal = { label: string; message: string };
type Scope = { report: (id: string, refusal: Refusal | null) => void };

const ScopeContext = createContext<Scope | null>(null);

export function useRefusals() {
  const entries = useRef(new Map<string, Refusal>());
  const [refused, setRefused] = useState<Refusal[]>([]);
  const scope = useMemo<Scope>(
    () => ({
      report(id, refusal) {
        const before = entries.current.get(id);
        if (refusal) {
          if (before && before.message === refusal.message && before.label === refusal.label) return;
          entries.current.set(id, refusal);
        } else if (!entries.current.delete(id)) {
          return;
        }
        setRefused([...entries.current.values()]);
      },
    }),
    [],
  );
  // `now()` reads the fields' latest reports, including one made by the blur that preceded a click.
  const now = useCallback(() => [...entries.current.values()], []);
  return { scope, refused, now };
}

export function RefusalScope({ refusals, children }: { refusals: ReturnType<typeof useRefusals>; children: ReactNode }) {
  return <ScopeContext.Provider value={refusals.scope}>{children}</ScopeContext.Provider>;
}

/** For a field: report this field's refusal (or null once it is fixed) to the form. */
export function useReportRefusal(label: string) {
  const scope = useContext(ScopeContext);
  const id = useId();
  useEffect(() => () => scope?.report(id, null), [scope, id]);
  return useCallback((message: string | null) => scope?.report(id, message ? { label, message } : null), [scope, id, label]);
}

/** Said beside a form's submit button while it is held back by refused fields. */
export function RefusedNotice({ refused, action }: { refused: Refusal[]; action: string }) {
  if (refused.length === 0) return null;
  return (
    <Notice tone="fault" title={`Not ${action}: ${refused.length === 1 ? "a field holds" : `${refused.length} fields hold`} text that is not a value`}>
      <ul className="list-disc pl-5" data-testid="refused-fields">
        {refused.map((r) => (
          <li key={`${r.label}-${r.message}`}>
            {r.label}: {r.message}
          </li>
        ))}
      </ul>
      Correct the marked {refused.length === 1 ? "field" : "fields"}, or press Escape in {refused.length === 1 ? "it" : "each"} to return to the saved value.
    </Notice>
  );
}
