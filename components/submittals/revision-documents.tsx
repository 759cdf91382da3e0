"use client";

import { useState } from "react";
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

// The issued PDF read on the page, in the browser's own viewer (opened on request: it is a
// few megabytes of drawing), with a plain link where the browser has no viewer.
export function PdfReader({ view }: { view: SubmittalView }) {
  const [showing, setShowing] = useState(false);
  if (!view.pdf) return null;
  return (
    <section className="flex flex-col gap-2" aria-label="The submittal PDF">
      <button type="button" className="self-start rounded-sheet border border-ink/40 bg-white/70 px-3 py-1.5 text-sm font-medium hover:border-copper" aria-expanded={showing} onClick={() => setShowing((s) => !s)}>
        {showing ? "Hide the PDF" : `Read the PDF of revision ${view.letter} on this page`}
      </button>
      {showing && (
        <object data={view.pdf.url} type="application/pdf" title={`Submittal PDF, revision ${view.letter}`} className="h-[80vh] w-full rounded-sheet border border-ink/25 bg-white">
          <p className="p-4 text-sm">
            This browser does not show PDFs inside a page.{" "}
            <a href={view.pdf.url} target="_blank" rel="noopener" className="font-semibold text-copper-deep underline">
              Open the submittal PDF
            </a>{" "}
            instead.
          </p>
        </object>
      )}
    </section>
  );
}
