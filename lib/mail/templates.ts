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

// Account messages. Each says what happened, when, and what to do if it was not you.
function notice(subject: string, lines: string[], link: { href: string; label: string }) {
  const text = `${lines.join("\n\n")}\n\n${link.label}: ${link.href}\n`;
  return { subject, text, html: layout(subject, lines, link) };
}

export function passwordResetMail(p: { name: string; link: string; expiresAt: Date }) {
  return notice(
    "Set a new Cavitas password",
    [
      `Hello ${p.name}, someone (we hope you) asked to set a new password for this Cavitas account.`,
      `The link below works once and until ${p.expiresAt.toUTCString()}. Your current password keeps working until you use it.`,
      "If you did not ask for this, ignore this message: nothing changes.",
    ],
    { href: p.link, label: "Set a new password" },
  );
}

export function passwordChangedMail(p: { name: string; how: "changed" | "reset"; at: Date; signInLink: string; resetLink: string }) {
  const what = p.how === "reset" ? "was set through a reset link" : "was changed from the settings page";
  return notice(
    "Your Cavitas password was changed",
    [
      `Hello ${p.name}, the password of your Cavitas account ${what} on ${p.at.toUTCString()}.`,
      p.how === "reset" ? "Every device that was signed in has been signed out." : "Your other devices have been signed out.",
      `If this was not you, set a new password at once: ${p.resetLink}`,
    ],
    { href: p.signInLink, label: "Sign in" },
  );
}

export function accountDisabledMail(p: { name: string; adminName: string; firmName: string; at: Date; signInLink: string }) {
  return notice(
    `Your ${p.firmName} account on Cavitas was disabled`,
    [
      `Hello ${p.name}, ${p.adminName} disabled your Cavitas account with ${p.firmName} on ${p.at.toUTCString()}. You have been signed out everywhere and cannot sign in until it is re-enabled.`,
      "Your review pins, replies and decisions stay in the projects under your name.",
      `Ask ${p.adminName} if you think this is a mistake.`,
    ],
    { href: p.signInLink, label: "Cavitas" },
  );
}

export function accountEnabledMail(p: { name: string; adminName: string; firmName: string; signInLink: string }) {
  return notice(
    `Your ${p.firmName} account on Cavitas is active again`,
    [`Hello ${p.name}, ${p.adminName} re-enabled your Cavitas account with ${p.firmName}. You can sign in with your password as before.`],
    { href: p.signInLink, label: "Sign in" },
  );
}

export function removedFromProjectMail(p: { name: string; byName: string; projectName: string; role: ProjectRole; projectsLink: string }) {
  return notice(
    `You were removed from ${p.projectName} on Cavitas`,
    [
      `Hello ${p.name}, ${p.byName} removed you from the project "${p.projectName}", where you were ${ROLE_WORDS[p.role].toLowerCase()}.`,
      "Your pins and replies stay in the project under your name. Ask the project's consultant if you need access again.",
    ],
    { href: p.projectsLink, label: "Your projects" },
  );
}

export function signedOutEverywhereMail(p: { name: string; count: number; at: Date; resetLink: string }) {
  return notice(
    "You were signed out of Cavitas everywhere",
    [
      `Hello ${p.name}, on ${p.at.toUTCString()} you signed out of Cavitas on every device (${p.count} session${p.count === 1 ? "" : "s"} ended).`,
      `If this was not you, someone may know your password: set a new one at ${p.resetLink}`,
    ],
    { href: p.resetLink, label: "Set a new password" },
  );
}

// Submittal messages. Each names the project, the room and the revision, and the SHA-256 that
// identifies the document, so a reader can tell which file the message is about.
type RevisionRef = { projectName: string; roomName: string; letter: string };
const revisionName = (r: RevisionRef) => `${r.roomName}, revision ${r.letter}`;

export function submittalIssuedMail(p: RevisionRef & { consultantName: string; role: ProjectRole; pdfSha256: string; supersedes: string | null; link: string }) {
  const ask = p.role === "client" ? "Please read it and approve it, approve it as noted, or return it with your notes." : "It is there to read and comment on.";
  return notice(
    `Submittal issued: ${revisionName(p)} (${p.projectName})`,
    [
      `${p.consultantName} issued revision ${p.letter} of the submittal for ${p.roomName} in "${p.projectName}".${p.supersedes ? ` It supersedes revision ${p.supersedes}.` : ""}`,
      ask,
      `The submittal PDF's SHA-256 is ${p.pdfSha256}.`,
    ],
    { href: p.link, label: "Open the submittal" },
  );
}

export function submittalDecidedMail(p: RevisionRef & { outcome: "approved" | "approved-as-noted" | "returned"; signerName: string; notes: string; link: string }) {
  const what = { approved: "approved", "approved-as-noted": "approved as noted", returned: "returned for revision" }[p.outcome];
  const lines = [
    `${p.signerName} ${what} revision ${p.letter} of the submittal for ${p.roomName} in "${p.projectName}".`,
    p.notes ? `Their notes: ${p.notes}` : "They added no notes.",
    p.outcome === "returned" ? "Revise the design and issue the next revision." : "The installer has been sent the shop pack.",
  ];
  return notice(`Submittal ${what}: ${revisionName(p)} (${p.projectName})`, lines, { href: p.link, label: "Open the submittal" });
}

export function shopPackReadyMail(p: RevisionRef & { outcome: "approved" | "approved-as-noted"; notes: string; packName: string; packSha256: string; link: string }) {
  return notice(
    `Ready to build: ${revisionName(p)} (${p.projectName})`,
    [
      `Revision ${p.letter} of the submittal for ${p.roomName} in "${p.projectName}" was ${p.outcome === "approved" ? "approved" : "approved as noted"}. Its shop pack is ready to download.`,
      ...(p.outcome === "approved-as-noted" ? [`Build to the client's notes: ${p.notes}`] : []),
      `The file ${p.packName} has the SHA-256 ${p.packSha256}; check the download against it before you build.`,
    ],
    { href: p.link, label: "Open the shop pack" },
  );
}
