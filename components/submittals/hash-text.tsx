"use client";

import { useState } from "react";

// A SHA-256 written out in full, in figures, breaking anywhere, with a button that copies it
// (so it can be pasted beside a checksum tool's answer).
export function HashText({ hash, label, testId }: { hash: string; label: string; testId?: string }) {
  const [copied, setCopied] = useState(false);
  return (
    <div className="flex items-start gap-2">
      <code className="figures min-w-0 break-all text-[12px] leading-relaxed text-ink" data-testid={testId}>
        {hash}
      </code>
      <button
        type="button"
        className="shrink-0 rounded-sheet border border-ink/30 px-1.5 py-0.5 text-[11px] text-ink-soft hover:border-copper hover:text-copper-deep"
        onClick={async () => {
          await navigator.clipboard?.writeText(hash).catch(() => undefined);
          setCopied(true);
          setTimeout(() => setCopied(false), 1500);
        }}
      >
        {copied ? "Copied" : "Copy"}
        <span className="sr-only"> {label}</span>
      </button>
    </div>
  );
}
