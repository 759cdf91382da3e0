/**
 * The class a room requires: its own when the consultant entered one, otherwise the project's
 * default; and each build-up the room uses, judged against it. A flag, not an approval: the
 * governing code and the authority having jurisdiction decide (SAFETY.md).
 */
import type { FireStandard } from "./classes";
import { type FireFinding, fireFinding } from "./compare";

export interface FireRequirement {
  /** the class as entered, null when neither the room nor the project names one */
  required: string | null;
  from: "room" | "project" | null;
}

export function requiredFireClass(entered: { project: string | null; room: string | null }): FireRequirement {
  const room = entered.room?.trim();
  if (room) return { required: room, from: "room" };
  const project = entered.project?.trim();
  return project ? { required: project, from: "project" } : { required: null, from: null };
}

export interface BuildUpFire {
  id: string;
  name: string;
  fireStandard: FireStandard;
  fireClass: string;
}

export interface RoomFire extends FireRequirement {
  project: string | null;
  room: string | null;
  /** one per build-up the room uses, in the order given */
  findings: { buildUpId: string; name: string; finding: FireFinding }[];
  flagged: number;
}

export function roomFire(entered: { project: string | null; room: string | null }, buildUps: readonly BuildUpFire[]): RoomFire {
  const requirement = requiredFireClass(entered);
  const findings = buildUps.map((b) => ({ buildUpId: b.id, name: b.name, finding: fireFinding({ standard: b.fireStandard, declared: b.fireClass, required: requirement.required }) }));
  return { ...requirement, project: entered.project, room: entered.room, findings, flagged: findings.filter((f) => f.finding.flagged).length };
}
