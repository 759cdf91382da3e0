"use client";

import { useState } from "react";
import { useUpdateProject } from "@/lib/queries/projects";
import { ApiError } from "@/lib/queries/api";
import type { UnitPreference } from "@/lib/units";
import { Button } from "@/components/ui/button";
import { MeasureField } from "@/components/ui/measure-field";

// The project's edge clearance: the least distance the boards accept between a panel and a
// surface edge or an opening before they flag it.
export function ClearanceForm({ projectId, clearance, units }: { projectId: string; clearance: number; units: UnitPreference }) {
  const [value, setValue] = useState(clearance);
  const update = useUpdateProject(projectId);
  const err = update.error instanceof ApiError ? update.error : null;
  return (
    <div className="flex items-end gap-3">
      <div className="w-40">
        <MeasureField label="Edge clearance" metres={value} units={units} onChange={setValue} error={err?.fieldMessage("edgeClearance")} testId="edge-clearance" />
      </div>
      <Button tone="plain" disabled={value === clearance || update.isPending} onClick={() => update.mutate({ edgeClearance: value })}>
        {update.isSuccess && value === clearance ? "Saved" : "Save"}
      </Button>
    </div>
  );
}
