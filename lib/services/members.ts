import { and, count, eq } from "drizzle-orm";
import { getDb, transaction } from "@/db/client";
import { membership, user } from "@/db/schema";
import { conflict, notFound } from "@/lib/errors";
import { deliver, enqueueMail } from "@/lib/mail/outbox";
import { LINKS } from "@/lib/mail/links";
import { removedFromProjectMail } from "@/lib/mail/templates";
import type { Actor } from "./actor";
import { authorize } from "./guard";
import { recordAudit } from "./audit";

// A consultant takes someone off a project. Their pins and replies stay, under their name;
// the project is never left without a consultant.
export async function removeMember(actor: Actor | null, projectId: string, userId: string) {
  const access = authorize(actor, projectId, "team.remove");
  const db = getDb();
  const member = db
    .select({ id: membership.id, role: membership.role, name: user.name, email: user.email })
    .from(membership)
    .innerJoin(user, eq(user.id, membership.userId))
    .where(and(eq(membership.projectId, projectId), eq(membership.userId, userId)))
    .get();
  if (!member) throw notFound("Member");
  if (member.role === "consultant") {
    const consultants = db
      .select({ n: count() })
      .from(membership)
      .where(and(eq(membership.projectId, projectId), eq(membership.role, "consultant")))
      .get()!.n;
    if (consultants <= 1) {
      throw conflict(`${member.name} is the only consultant on this project. Invite another consultant before removing them.`);
    }
  }
  const mailId = transaction((tx) => {
    tx.delete(membership).where(eq(membership.id, member.id)).run();
    recordAudit(tx, { actorId: access.actor.userId, projectId, action: "member.removed", subjectId: userId, detail: { role: member.role } });
    const mail = removedFromProjectMail({ name: member.name, byName: access.actor.name, projectName: access.project.name, role: member.role, projectsLink: LINKS.projects() });
    return enqueueMail(tx, { to: member.email, projectId, ...mail });
  });
  await deliver([mailId]);
  return { removed: userId, self: userId === access.actor.userId };
}
