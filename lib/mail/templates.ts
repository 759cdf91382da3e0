import { ROLE_WORDS } from "@/lib/permissions";
import type { ProjectRole } from "@/db/schema/project";

const escape = (s: string) =>
  s.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]!);

function layout(title: string, paragraphs: string[], link: { href: string; label: string }): string {
  const body = paragraphs.map((p) => `<p style="margin:0 0 12px">${escape(p)}</p>`).join("");
  return `<div style="font-family:sans-serif;color:#1a2740;background:#f6f2e9;padding:24px">
<h1 style="font-size:18px;margin:0 0 16px">${escape(title)}</h1>${body}
<p><a href="${escape(link.href)}" style="color:#8a4520">${escape(link.label)}</a></p>
<p style="font-size:12px;color:#566075">Cavitas. If you did not expect this message, you can ignore it.</p></div>`;
}

export function projectInvitationMail(p: {
  inviterName: string;
  projectName: string;
  role: ProjectRole;
  link: string;
  message: string;
  expiresAt: Date;
}) {
  const role = ROLE_WORDS[p.role].toLowerCase();
  const subject = `${p.inviterName} invites you to ${p.projectName} on Cavitas`;
  const lines = [
    `${p.inviterName} has invited you to join the project "${p.projectName}" as ${role}.`,
    ...(p.message ? [`Their note: ${p.message}`] : []),
    `The link below works once and until ${p.expiresAt.toUTCString()}.`,
  ];
  const text = `${lines.join("\n\n")}\n\nAccept the invitation: ${p.link}\n`;
  return { subject, text, html: layout(subject, lines, { href: p.link, label: "Accept the invitation" }) };
}

export function firmInvitationMail(p: { inviterName: string; firmName: string; link: string; message: string; expiresAt: Date }) {
  const subject = `${p.inviterName} invites you to ${p.firmName} on Cavitas`;
  const lines = [
    `${p.inviterName} has invited you to open an account with ${p.firmName} on Cavitas.`,
    ...(p.message ? [`Their note: ${p.message}`] : []),
    `The link below works once and until ${p.expiresAt.toUTCString()}.`,
  ];
  const text = `${lines.join("\n\n")}\n\nAccept the invitation: ${p.link}\n`;
  return { subject, text, html: layout(subject, lines, { href: p.link, label: "Accept the invitation" }) };
}
