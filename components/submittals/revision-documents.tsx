"use client";

import type { DocumentLink, SubmittalView } from "@/lib/services/submittals";
import { Sheet } from "@/components/ui/sheet";
import { HashText } from "./hash-text";

const kb = (bytes: number) => (bytes >= 1048576 ? `${(bytes / 1048576).toFixed(1)} MB` : `${Math.max(1, Math.round(bytes / 1024))} kB`);
const LABEL = { submittal: "Submittal PDF", "decision-record": "Decision record", "shop-pack": "Shop pack" } as const;

function DocumentRow({ doc, testId }: { doc: DocumentLink; testId: string }) {
  const label = doc.kind === "shop-pack" ? `${LABEL[doc.kind]} (${doc.units})` : LABEL[doc.kind];
  return (
    <li className="flex flex-col gap-1 border-b border-ink/10 pb-3" data-testid={testId}>
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <span className="text-sm font-semibold">{label}</span>
        <span className="flex gap-3 text-xs">
          {doc.kind !== "shop-pack" && (
            <a href={doc.url} target="_blank" rel="noopener" className="font-semibold text-copper-deep underline-offset-4 hover:underline">
              Open<span className="sr-only"> the {label}</span>
            </a>
          )}
          <a href={doc.kind === "shop-pack" ? doc.url : `${doc.url}?download=1`} download={doc.name} className="font-semibold text-copper-deep underline-offset-4 hover:underline">
            Download<span className="sr-only"> the {label}</span>
          </a>
        </span>
      </div>
      <span className="figures text-xs text-ink-soft">
        {doc.name} · {kb(doc.size)}
      </span>
      <HashText hash={doc.sha256} label={`SHA-256 of the ${label}`} />
    </li>
  );
}

// The revision's stored files, each with its SHA-256.
export function RevisionDocuments({ view }: { view: SubmittalView }) {
  const docs = [view.pdf, view.decisionRecord, ...view.shopPacks].filter((d): d is DocumentLink => d !== null);
  return (
    <Sheet title="Documents">
      {docs.length === 0 ? (
        <p className="text-sm text-ink-soft">No documents yet: this revision has not been issued.</p>
      ) : (
        <ul className="flex flex-col gap-3">
          {docs.map((d) => (
            <DocumentRow key={`${d.kind}-${d.units}`} doc={d} testId={`document-${d.kind}`} />
          ))}
        </ul>
      )}
    </Sheet>
  );
}

// The issued PDF, opened in the browser's own viewer in a new tab: stored files are never
// framed inside a page (the app's security policy), and the viewer gives the reader the whole window.
export function PdfReader({ view }: { view: SubmittalView }) {
  if (!view.pdf) return null;
  return (
    <a
      href={view.pdf.url}
      target="_blank"
      rel="noopener"
      className="inline-flex items-center gap-2 self-start rounded-sheet border border-ink bg-ink px-3.5 py-2 text-sm font-medium text-paper hover:bg-ink-soft"
      data-testid="read-pdf"
    >
      Read the submittal PDF of revision {view.letter}
      <span className="text-xs font-normal text-paper/80">(opens in a new tab)</span>
    </a>
  );
}
