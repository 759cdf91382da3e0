"use client";

import { useUpdateProject } from "@/lib/queries/projects";
import { ApiError } from "@/lib/queries/api";
import { Sheet } from "@/components/ui/sheet";
import { FIRE_DEFERRAL } from "@/components/fire/fire-findings";
import { RequiredClassForm } from "@/components/fire/required-class-form";

// The fire class every room of the project requires unless a room names its own, in either
// system; the consultant sets it, everyone reads it.
export function ProjectFire({ projectId, required, mayEdit }: { projectId: string; required: string | null; mayEdit: boolean }) {
  const update = useUpdateProject(projectId);
  return (
    <Sheet title="Fire: required class">
      {mayEdit ? (
        <RequiredClassForm
          name="fireRequired"
          label="Rooms require, unless they say otherwise"
          value={required}
          hint="A European class (B-s1,d0) or a North American one (Class A). Each room may set its own on its Check."
          serverError={update.error instanceof ApiError ? update.error.fieldMessage("fireRequired") : undefined}
          saving={update.isPending}
          onSave={(fireRequired) => update.mutateAsync({ fireRequired })}
        />
      ) : (
        <p className="text-sm" data-testid="project-fire">
          Rooms require {required ?? "no class entered yet"}, unless a room says otherwise.
        </p>
      )}
      <p className="mt-3 text-xs text-ink-soft">{FIRE_DEFERRAL}</p>
    </Sheet>
  );
}
