import Link from "next/link";
import type { ProjectProgress } from "@/lib/services/submittals";
import { Sheet } from "@/components/ui/sheet";
import { TableHead } from "@/components/ui/table-head";

// Install progress of the approved revisions in force, per room and for the project.
export function ProgressTable({ projectId, progress, linkToInstall }: { projectId: string; progress: ProjectProgress; linkToInstall: boolean }) {
  const pct = (n: number, of: number) => (of ? Math.round((100 * n) / of) : 0);
  return (
    <Sheet title="Installation" aside={<span className="figures text-xs text-ink-soft" data-testid="project-progress">{`${progress.installed} of ${progress.panels} panels installed`}</span>}>
      {progress.rooms.length === 0 ? (
        <p className="text-sm text-ink-soft">No revision is approved yet, so nothing is being built.</p>
      ) : (
        <table className="w-full text-sm" data-testid="progress-table">
          <TableHead cells={[{ label: "Room" }, { label: "Revision" }, { label: "Installed" }, { label: "Photos", numeric: true }]} />
          <tbody>
            {progress.rooms.map((r) => (
              <tr key={r.submittalId} className="border-b border-ink/10" data-room={r.roomName}>
                <td className="py-2 pr-3 font-medium">
                  {linkToInstall ? (
                    <Link href={`/projects/${projectId}/shop-pack/${r.submittalId}`} className="underline-offset-4 hover:text-copper-deep hover:underline">
                      {r.roomName}
                    </Link>
                  ) : (
                    r.roomName
                  )}
                </td>
                <td className="py-2 pr-3">{r.letter}</td>
                <td className="py-2 pr-3">
                  <div className="flex items-center gap-3">
                    <span className="h-2 w-28 overflow-hidden rounded-full bg-paper-deep" aria-hidden>
                      <span className="block h-full bg-sage" style={{ width: `${pct(r.installed, r.panels)}%` }} />
                    </span>
                    <span className="figures text-xs" data-testid="room-progress">{`${r.installed} of ${r.panels}`}</span>
                  </div>
                </td>
                <td className="figures py-2 text-right">{r.photos}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </Sheet>
  );
}
