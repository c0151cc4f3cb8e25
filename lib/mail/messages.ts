import type { Role } from "@/lib/vocabulary";
import { LIGHT } from "@/lib/theme/palette";

/** The wording of Glowbench's own e-mails: plain text first, a simple HTML twin. */

const escape = (s: string) => s.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]!);

const ROLE_PHRASE: Record<Role, string> = {
  owner: "an owner (members, settings and invoices as well as the bench)",
  technician: "a technician (jobs, parts, readings and status changes)",
  apprentice: "an apprentice (every calculator with its working, notes and readings on jobs)",
};

function html(paragraphs: string[], link: { href: string; label: string }): string {
  const body = paragraphs.map((p) => `<p>${escape(p)}</p>`).join("");
  return `<div style="font-family:system-ui,sans-serif;font-size:16px;line-height:1.5;color:${LIGHT.ink}">${body}<p><a href="${escape(link.href)}" style="display:inline-block;background:${LIGHT.glow};color:${LIGHT["glow-ink"]};padding:10px 16px;border-radius:6px;text-decoration:none;font-weight:bold">${escape(link.label)}</a></p><p style="color:${LIGHT.muted};font-size:14px">${escape(link.href)}</p></div>`;
}

export function invitationMail(input: { workshopName: string; inviterName: string; role: Role; link: string; expiresAt: Date }) {
  const until = input.expiresAt.toLocaleDateString("en-GB", { day: "numeric", month: "long", year: "numeric", timeZone: "UTC" });
  const lead = `${input.inviterName} has invited you to join ${input.workshopName} on Glowbench as ${ROLE_PHRASE[input.role]}.`;
  const how = `Open the link to join. You can choose a password there, or use the one you already have if this address has a Glowbench account. The link works once and until ${until}.`;
  const ignore = "If you were not expecting this, ignore the e-mail; nothing happens unless the link is used.";
  return {
    subject: `Join ${input.workshopName} on Glowbench`,
    text: [lead, how, input.link, ignore].join("\n\n"),
    html:
      html([lead, how], { href: input.link, label: `Join ${input.workshopName}` }) +
      `<p style="font-family:system-ui,sans-serif;color:${LIGHT.muted};font-size:14px">${escape(ignore)}</p>`,
  };
}

export function passwordResetMail(input: { name: string; link: string }) {
  const lead = `Hello ${input.name}, someone (we hope you) asked to set a new Glowbench password for this address.`;
  const how = "Open the link within an hour to choose a new password. It works once; when you use it, every place you are signed in is signed out.";
  const ignore = "If you did not ask, ignore this e-mail: your password stays as it is.";
  return {
    subject: "Set a new Glowbench password",
    text: [lead, how, input.link, ignore].join("\n\n"),
    html:
      html([lead, how], { href: input.link, label: "Choose a new password" }) +
      `<p style="font-family:system-ui,sans-serif;color:${LIGHT.muted};font-size:14px">${escape(ignore)}</p>`,
  };
}
