import type { DocumentLink } from "@/lib/services/submittals";
import type { UnitPreference } from "@/lib/units";
import { HashText } from "@/components/submittals/hash-text";

const mb = (bytes: number) => (bytes >= 1048576 ? `${(bytes / 1048576).toFixed(1)} MB` : `${Math.max(1, Math.round(bytes / 1024))} kB`);

// The shop pack in the reader's units, its SHA-256 as recorded at approval, and how to check
// the downloaded file against it; the pack in the other units beside it.
export function PackDownload({ packs, units }: { packs: DocumentLink[]; units: UnitPreference }) {
  const mine = packs.find((p) => p.units === units) ?? packs[0];
  const other = packs.find((p) => p !== mine);
  if (!mine) return <p className="text-sm text-ink-soft">No shop pack was made for this revision.</p>;
  return (
    <div className="flex flex-col gap-3" data-testid="pack-download">
      <div className="flex flex-wrap items-center gap-3">
        <a href={mine.url} download={mine.name} className="inline-flex items-center gap-2 rounded-sheet border border-ink bg-ink px-3.5 py-2 text-sm font-medium text-paper hover:bg-ink-soft" data-testid="pack-link">
          Download the shop pack
        </a>
        <span className="figures text-xs text-ink-soft">
          {mine.name} · {mb(mine.size)} · lengths in {mine.units === "imperial" ? "inches" : "millimetres"}
        </span>
      </div>
      <div>
        <p className="text-xs font-semibold uppercase tracking-wider text-ink-soft">SHA-256, recorded at approval</p>
        <HashText hash={mine.sha256} label="SHA-256 of the shop pack" testId="pack-sha256" />
      </div>
      <details className="text-xs text-ink-soft">
        <summary className="cursor-pointer font-semibold text-ink">How to check the file</summary>
        <p className="mt-1">Work out the downloaded file&apos;s SHA-256 and compare it with the one above; if they differ, do not build from it.</p>
        <ul className="figures mt-1 flex flex-col gap-0.5">
          <li>Linux: sha256sum {mine.name}</li>
          <li>macOS: shasum -a 256 {mine.name}</li>
          <li>Windows: Get-FileHash {mine.name} -Algorithm SHA256</li>
        </ul>
        <p className="mt-1">Inside the zip, manifest.txt lists each file&apos;s own SHA-256 and the approved submittal PDF&apos;s.</p>
      </details>
      {other && (
        <p className="text-xs text-ink-soft">
          Also in {other.units} units:{" "}
          <a href={other.url} download={other.name} className="font-semibold text-copper-deep underline-offset-4 hover:underline">
            {other.name}
          </a>{" "}
          <span className="figures break-all">(SHA-256 {other.sha256})</span>
        </p>
      )}
    </div>
  );
}
