import Link from "next/link";
import { Notice } from "@/components/ui/notice";
import { TitleBlock } from "@/components/ui/sheet";

// A revision this person may not open in its state: the server's own reason, and the way back.
export function ClosedRevision({ projectId, message }: { projectId: string; message: string }) {
  return (
    <>
      <TitleBlock kicker="Submittal" title="This revision is not open to you" />
      <Notice tone="caution" title={message}>
        <Link href={`/projects/${projectId}/submittals`} className="font-semibold underline">
          See the submittals you may open
        </Link>
      </Notice>
    </>
  );
}
