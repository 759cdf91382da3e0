import { and, eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { project, room, submittal, user } from "@/db/schema";
import type { Actor } from "@/lib/services/actor";
import { decideSubmittal, getSubmittal, issueReadiness, issueSubmittal, setInstalled } from "@/lib/services/submittals";

// The demo's submittal story, played through the services as the demo accounts would (so it
// renders and stores real documents): the lecture room's revision A issued by the consultant,
// approved as noted by the client, and its first panels marked installed by the installer.
// Run once, after the demo scenario is seeded; the rehearsal room is left for a person to issue.

function demoActor(key: string): Actor {
  const row = getDb().select().from(user).where(eq(user.id, `demo-user-${key}`)).get();
  if (!row) throw new Error(`The demo account ${key} is missing`);
  return { userId: row.id, email: row.email, name: row.name, firmId: row.firmId, isFirmAdmin: row.isFirmAdmin, unitPreference: row.unitPreference };
}

export async function seedDemoSubmittals(): Promise<{ created: boolean }> {
  const db = getDb();
  const arts = db.select().from(project).where(eq(project.reference, "LRA-24")).get();
  if (!arts || db.select().from(submittal).where(eq(submittal.projectId, arts.id)).get()) return { created: false };
  const lecture = db.select().from(room).where(and(eq(room.projectId, arts.id), eq(room.name, "Lecture room"))).get();
  if (!lecture) return { created: false };
  const consultant = demoActor("consultant");
  const { letter, items } = issueReadiness(consultant, arts.id, lecture.id);
  const issued = await issueSubmittal(consultant, arts.id, { roomId: lecture.id, letter, confirm: items.map((i) => i.key) });
  const client = demoActor("client");
  await decideSubmittal(client, arts.id, issued.id, {
    outcome: "approved-as-noted",
    signature: "Cleo Client",
    notes: "Align the panel tops with the window head opposite (2.5 m), as the architect asked.",
    pdfSha256: getSubmittal(client, arts.id, issued.id).pdf!.sha256,
  });
  const installer = demoActor("installer");
  const panels = getSubmittal(installer, arts.id, issued.id).install?.placements ?? [];
  for (const p of panels.slice(0, 6)) setInstalled(installer, arts.id, issued.id, p.id, { installed: true });
  return { created: true };
}
