"use client";

import type { RoomView } from "@/lib/services/rooms";
import { useRoomFire } from "@/lib/queries/submittals";
import { ApiError } from "@/lib/queries/api";
import { Sheet } from "@/components/ui/sheet";
import { FIRE_DEFERRAL, FireFindings } from "./fire-findings";
import { RequiredClassForm } from "./required-class-form";

// The Check's fire block: the class this room requires (its own, or the project's) and each
// build-up it uses against it. The consultant may set the room's own class.
export function RoomFirePanel({ room, mayEdit }: { room: RoomView; mayEdit: boolean }) {
  const save = useRoomFire(room.projectId, room.id);
  const { fire } = room;
  const source = fire.from === "room" ? "this room's own" : fire.from === "project" ? "the project's default" : "none entered";
  return (
    <Sheet title={`Fire: required class${fire.flagged ? ` (${fire.flagged} flagged)` : ""}`} aside={<span className="text-xs text-ink-soft">{fire.required ? `${fire.required}, ${source}` : "none entered"}</span>}>
      <div className="flex flex-col gap-4" data-testid="room-fire">
        {mayEdit ? (
          <RequiredClassForm
            name="roomFireRequired"
            label="This room requires"
            value={fire.room}
            hint={fire.project ? `Empty: the project's default, ${fire.project}.` : "Empty: the project's default (none entered yet)."}
            serverError={save.error instanceof ApiError ? save.error.fieldMessage("fireRequired") : undefined}
            saving={save.isPending}
            onSave={(value) => save.mutateAsync(value)}
          />
        ) : (
          <p className="text-sm">Required: {fire.required ?? "no class entered"}</p>
        )}
        <FireFindings fire={fire} />
        <p className="text-xs text-ink-soft">{FIRE_DEFERRAL}</p>
      </div>
    </Sheet>
  );
}
