import Link from "next/link";
import type { ShopPackEntry } from "@/lib/services/submittals";
import type { UnitPreference } from "@/lib/units";
import { StateBadge } from "@/components/submittals/state-badge";
import { Sheet, TitleBlock } from "@/components/ui/sheet";
import { PackDownload } from "./pack-download";

// Shop pack: one per room whose revision is approved and in force, with its download, its
// hash and the install progress; the panels are recorded on each pack's own page.
export function ShopPackList({ projectId, entries, units }: { projectId: string; entries: ShopPackEntry[]; units: UnitPreference }) {
  return (
    <>
      <TitleBlock kicker="Shop pack" title="What to build" meta="The shop drawings, facing patterns, cut lists and placement schedules of each approved revision, and the panels installed so far." />
      {entries.length === 0 ? (
        <p className="text-sm text-ink-soft" data-testid="no-packs">
          No revision is approved yet. When the client approves one, its shop pack appears here and you are told by e-mail.
        </p>
      ) : (
        <div className="grid gap-6 lg:grid-cols-2" data-testid="shop-packs">
          {entries.map((e) => (
            <Sheet key={e.id} title={`${e.roomName}, revision ${e.letter}`} aside={<StateBadge state={e.state} />}>
              {e.state === "approved-as-noted" && e.notes && (
                <p className="mb-3 border-l-2 border-caution pl-3 text-sm">
                  <span className="font-semibold">Build to the client&apos;s notes:</span> {e.notes}
                </p>
              )}
              <PackDownload packs={e.packs} units={units} />
              <div className="mt-4 flex flex-wrap items-center justify-between gap-3 border-t border-ink/15 pt-3 text-sm">
                <span className="figures">{`${e.installed} of ${e.panels} panels installed`}</span>
                <Link href={`/projects/${projectId}/shop-pack/${e.id}`} className="font-semibold text-copper-deep underline-offset-4 hover:underline">
                  Panels and progress<span className="sr-only"> of {e.roomName}</span>
                </Link>
              </div>
            </Sheet>
          ))}
        </div>
      )}
    </>
  );
}
