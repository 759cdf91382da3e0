"use client";

import { useEffect, useState } from "react";

// Shown while the server renders documents (a few seconds): what it is doing, the seconds so
// far, and a moving bar, so the page never looks frozen. Announced politely once.
export function Working({ what, expectSeconds }: { what: string; expectSeconds: number }) {
  const [seconds, setSeconds] = useState(0);
  useEffect(() => {
    const started = Date.now();
    const timer = setInterval(() => setSeconds(Math.floor((Date.now() - started) / 1000)), 500);
    return () => clearInterval(timer);
  }, []);
  return (
    <div className="rounded-sheet border border-ink/25 bg-white/70 px-4 py-3 text-sm" data-testid="working">
      <p role="status" className="font-medium">
        {what}
      </p>
      <progress className="mt-2 h-1.5 w-full accent-copper" aria-label={what} />
      <p className="figures mt-1 text-xs text-ink-soft" aria-hidden>
        {seconds} s so far; this usually takes about {expectSeconds} s. You can keep reading meanwhile.
      </p>
    </div>
  );
}
