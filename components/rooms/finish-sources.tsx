import type { MaterialView } from "@/lib/services/materials";
import type { Surface } from "@/lib/rooms/geometry";
import { Sheet } from "@/components/ui/sheet";

// Beside the check: every finish the room's numbers rest on, where it is used and where its
// coefficients come from (book and table, a test report, or from memory where no published
// value was found), so a consultant can cite them or replace them.
export function FinishSources({ surfaces, materials }: { surfaces: Surface[]; materials: MaterialView[] }) {
  const uses = new Map<string, string[]>();
  const add = (key: string, where: string) => uses.set(key, [...(uses.get(key) ?? []), where]);
  for (const s of surfaces) {
    add(s.finish, s.name);
    for (const o of s.openings) add(o.material, `${o.name ?? o.kind} on ${s.name}`);
  }
  const rows = [...uses.entries()].map(([key, where]) => ({ key, where, material: materials.find((m) => m.key === key) }));
  const recalled = rows.filter((r) => r.material?.provenance === "from memory").length;
  return (
    <Sheet title="Finishes and their sources">
      <ul className="flex flex-col divide-y divide-ink/10 text-xs" data-testid="finish-sources">
        {rows.map(({ key, where, material }) => (
          <li key={key} className="py-1.5" data-finish={key}>
            <p className="font-medium">
              {material?.name ?? key} <span className="font-normal text-ink-faint">· {where.join(", ")}</span>
            </p>
            <p className={`text-[11px] ${material?.provenance === "from memory" ? "text-caution-deep" : "text-ink-soft"}`}>{material ? material.source : "unknown material"}</p>
          </li>
        ))}
      </ul>
      {recalled > 0 && (
        <p className="mt-2 text-[11px] text-caution-deep">
          {recalled === 1 ? "One finish has" : `${recalled} finishes have`} no published value: recalled from memory. Replace with a test report of the product before relying on the result.
        </p>
      )}
    </Sheet>
  );
}
