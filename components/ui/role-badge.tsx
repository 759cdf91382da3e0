import type { ProjectRole } from "@/lib/roles";
import { ROLE_WORDS } from "@/lib/permissions";

// Each role gets a mark of its own; copper is kept for the consultant who designs.
const STYLE: Record<ProjectRole, string> = {
  consultant: "border-copper text-copper-deep bg-copper-soft/50",
  architect: "border-ink/50 text-ink bg-paper-deep",
  installer: "border-sage text-sage bg-sage-soft/60",
  client: "border-ink-faint text-ink-soft bg-white/70",
};

export function RoleBadge({ role }: { role: ProjectRole }) {
  return (
    <span data-role={role} className={`inline-block rounded-sheet border px-2 py-0.5 text-[11px] font-semibold uppercase tracking-wider ${STYLE[role]}`}>
      {ROLE_WORDS[role]}
    </span>
  );
}
