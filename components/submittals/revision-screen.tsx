"use client";

import Link from "next/link";
import { useQuery } from "@tanstack/react-query";
import type { SubmittalView } from "@/lib/services/submittals";
import { submittalQuery } from "@/lib/queries/submittals";
import { formatInstant } from "@/lib/documents/format";
import type { UnitPreference } from "@/lib/units";
import { Notice } from "@/components/ui/notice";
import { TitleBlock } from "@/components/ui/sheet";
import { DecisionForm } from "./decision-form";
import { DecisionBlock, RevisionFacts } from "./revision-facts";
import { PdfReader, RevisionDocuments } from "./revision-documents";
import { RevisionHistory } from "./revision-history";
import { StateBadge } from "./state-badge";

function StateNotice({ view }: { view: SubmittalView }) {
  const base = `/projects/${view.projectId}`;
  if (view.state === "draft") {
    return (
      <Notice tone={view.renderError ? "fault" : "info"} title="A draft: not issued">
        {view.renderError ? `The last attempt to issue it failed: ${view.renderError}` : "It becomes a revision when it is issued from Submittals."}
      </Notice>
    );
  }
  if (view.state === "superseded") {
    return (
      <Notice title="Superseded">
        Kept as it was issued.{" "}
        {view.supersededBy && (
          <Link href={`${base}/submittals/${view.supersededBy.id}`} className="font-semibold text-copper-deep underline">
            Revision {view.supersededBy.letter} replaces it.
          </Link>
        )}
      </Notice>
    );
  }
  if (view.state === "returned") return <Notice tone="caution" title="Returned for revision">The consultant revises the design and issues the next revision.</Notice>;
  if (view.state === "issued") return <Notice title="Awaiting the client's decision">{view.may.decide ? "Read the PDF, then decide below." : "The client has been asked to approve it, approve it as noted, or return it."}</Notice>;
  return (
    <Notice tone="ok" title={view.state === "approved" ? "Approved: ready to build" : "Approved as noted: build to the notes"}>
      {view.may.shop ? (
        <Link href={`${base}/shop-pack/${view.id}`} className="font-semibold underline">
          Open the shop pack and the install record
        </Link>
      ) : (
        "The installer builds from its shop pack."
      )}
    </Notice>
  );
}

// One revision: its state, its documents with their hashes, the decision (or the form to make
// it), what changed and what it holds, and its history.
export function RevisionScreen({ initial, units }: { initial: SubmittalView; units: UnitPreference }) {
  const { data: view = initial, refetch } = useQuery({ ...submittalQuery(initial.projectId, initial.id), initialData: initial });
  return (
    <>
      <TitleBlock
        kicker="Submittal"
        title={`${view.roomName}: revision ${view.letter}`}
        meta={
          <span className="flex flex-wrap items-center gap-3" data-testid="revision-meta">
            <StateBadge state={view.state} />
            {view.issuedAt && <span>{`Issued ${formatInstant(view.issuedAt)} by ${view.issuedBy}`}</span>}
            <Link href={`/projects/${view.projectId}/submittals`} className="text-copper-deep underline-offset-4 hover:underline">
              All submittals
            </Link>
          </span>
        }
      />
      <div className="mb-6">
        <StateNotice view={view} />
      </div>
      <div className="grid gap-8 xl:grid-cols-[1.4fr_1fr]">
        <div className="flex flex-col gap-6">
          <PdfReader view={view} />
          {view.may.decide && <DecisionForm view={view} onDecided={() => void refetch()} />}
          {view.decision && <DecisionBlock decision={view.decision} />}
          <RevisionFacts view={view} units={units} />
        </div>
        <div className="flex flex-col gap-6">
          <RevisionDocuments view={view} />
          {view.snapshotSha256 && (
            <p className="text-xs text-ink-soft">
              Snapshot SHA-256 <span className="figures break-all text-ink">{view.snapshotSha256}</span>, printed on the PDF&apos;s cover.
            </p>
          )}
          <RevisionHistory lines={view.history} />
        </div>
      </div>
    </>
  );
}
