"use client";

import Link from "next/link";
import { useQuery } from "@tanstack/react-query";
import { useState } from "react";
import type { SubmittalList } from "@/lib/services/submittals";
import { submittalsQuery } from "@/lib/queries/submittals";
import { formatInstant } from "@/lib/documents/format";
import { compareRevisions, nextRevisionLetter } from "@/lib/submittals/revision";
import { Button } from "@/components/ui/button";
import { Sheet, TitleBlock } from "@/components/ui/sheet";
import { TableHead } from "@/components/ui/table-head";
import { IssuePanel } from "./issue-panel";
import { ProgressTable } from "./progress-table";
import { StateBadge } from "./state-badge";

/** The letter the room's next issue will carry: a draft's own, or the one after the latest issued. */
function nextLetter(revisions: SubmittalList["rooms"][number]["revisions"]): string {
  const draft = revisions.find((r) => r.state === "draft");
  if (draft) return draft.letter;
  const issued = revisions.filter((r) => r.state !== "draft").map((r) => r.letter).sort(compareRevisions);
  return nextRevisionLetter(issued.at(-1) ?? null);
}

const INTRO: Record<SubmittalList["myRole"], string> = {
  consultant: "Each room's submittal, revision by revision. Issue the next revision when the design is ready; the client decides on it.",
  architect: "Each room's submittal, revision by revision, with its documents and history.",
  client: "Submittals issued to you. Open a revision to read its PDF and approve it, approve it as noted, or return it with your notes.",
  installer: "The approved revisions you build from. Their shop packs are under Shop pack.",
};

// Submittals: per room, its revisions newest first, with the state, who issued and decided
// them; the consultant issues from here; everyone sees the install progress.
export function SubmittalListView({ projectId, initial }: { projectId: string; initial: SubmittalList }) {
  const { data = initial } = useQuery({ ...submittalsQuery(projectId), initialData: initial });
  const [issuing, setIssuing] = useState<string | null>(null);
  return (
    <>
      <TitleBlock kicker="Submittals" title="Submittals and their revisions" meta={INTRO[data.myRole]} />
      <div className="grid gap-8 xl:grid-cols-[1.6fr_1fr]">
        <div className="flex flex-col gap-6" data-testid="submittal-rooms">
          {data.rooms.length === 0 && <p className="text-sm text-ink-soft">Nothing has been issued to you yet. You will be told by e-mail when it is.</p>}
          {data.rooms.map((room) => (
            <Sheet
              key={room.roomId ?? room.roomName}
              title={room.roomName}
              aside={
                data.may.issue && room.roomId && issuing !== room.roomId ? (
                  <Button tone="plain" onClick={() => setIssuing(room.roomId)}>
                    Issue revision {nextLetter(room.revisions)}
                    <span className="sr-only"> of {room.roomName}</span>
                  </Button>
                ) : undefined
              }
            >
              {room.revisions.length === 0 ? (
                <p className="text-sm text-ink-soft">No revision issued yet.</p>
              ) : (
                <table className="w-full text-sm" data-testid="revision-table">
                  <TableHead cells={[{ label: "Revision" }, { label: "State" }, { label: "Issued" }, { label: "Decided" }]} />
                  <tbody>
                    {room.revisions.map((r) => (
                      <tr key={r.id} className="border-b border-ink/10" data-letter={r.letter}>
                        <td className="whitespace-nowrap py-2 pr-3 font-medium">
                          <Link href={`/projects/${projectId}/submittals/${r.id}`} className="underline-offset-4 hover:text-copper-deep hover:underline">
                            Revision {r.letter}
                            <span className="sr-only"> of {room.roomName}</span>
                          </Link>
                        </td>
                        <td className="py-2 pr-3">
                          <StateBadge state={r.state} />
                          {r.renderError && <span className="ml-2 text-xs text-fault">last attempt failed</span>}
                        </td>
                        <td className="py-2 pr-3 text-xs text-ink-soft">{r.issuedAt ? `${formatInstant(r.issuedAt)}, ${r.issuedBy}` : "—"}</td>
                        <td className="py-2 text-xs text-ink-soft">{r.decidedAt ? `${formatInstant(r.decidedAt)}, ${r.decidedBy}` : "—"}</td>
                      </tr>
                    ))}
                  </tbody>
                </table>
              )}
              {issuing === room.roomId && room.roomId && <IssuePanel projectId={projectId} roomId={room.roomId} onClose={() => setIssuing(null)} />}
            </Sheet>
          ))}
        </div>
        <div className="flex flex-col gap-6">
          <ProgressTable projectId={projectId} progress={data.progress} linkToInstall={data.may.shop} />
        </div>
      </div>
    </>
  );
}
