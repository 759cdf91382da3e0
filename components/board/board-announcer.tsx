"use client";

import { useEffect, useState } from "react";

// A polite live region that speaks `text` once it has stopped changing for a moment, so a
// drag is announced where it ends, not at every frame.
export function Announcer({ text, delayMs = 700, testId }: { text: string; delayMs?: number; testId?: string }) {
  const [spoken, setSpoken] = useState("");
  useEffect(() => {
    const t = setTimeout(() => setSpoken(text), delayMs);
    return () => clearTimeout(t);
  }, [text, delayMs]);
  return (
    <p className="sr-only" role="status" aria-live="polite" data-testid={testId}>
      {spoken}
    </p>
  );
}
