import type { OutgoingMail } from "./transport";
import { withArticle, type Role } from "@/lib/roles";

const escapeHtml = (s: string) => s.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]!);

/** One layout for every message: a greeting, paragraphs, one link, and a closing line. */
function compose(to: string, subject: string, paragraphs: string[], link: { label: string; url: string }, closing: string): OutgoingMail {
  const text = [...paragraphs, `${link.label}: ${link.url}`, closing, "— Spanwright"].join("\n\n");
  const html = `<div style="font-family:system-ui,sans-serif;font-size:16px;line-height:1.5;color:#111822;max-width:36rem">
${paragraphs.map((p) => `<p>${escapeHtml(p)}</p>`).join("\n")}
<p><a href="${escapeHtml(link.url)}" style="display:inline-block;background:#11573d;color:#fff;padding:12px 20px;border-radius:8px;text-decoration:none;font-weight:600">${escapeHtml(link.label)}</a></p>
<p style="color:#4d5d71;font-size:14px">${escapeHtml(closing)}</p>
<p style="color:#4d5d71;font-size:14px">— Spanwright</p></div>`;
  return { to, subject, text, html };
}

export function invitationMail(input: { to: string; crewName: string; inviterName: string; role: Role; url: string; days: number }): OutgoingMail {
  return compose(
    input.to,
    `Join ${input.crewName} on Spanwright`,
    [
      `${input.inviterName} has asked you to join ${input.crewName} on Spanwright as ${withArticle(input.role)}.`,
      "Spanwright is where the crew plans its lines, checks the numbers and signs rigs off before anyone walks.",
    ],
    { label: "Accept the invitation", url: input.url },
    `The link works once and for ${input.days} days. If you did not expect it, ignore this message.`,
  );
}

export function passwordResetMail(input: { to: string; url: string }): OutgoingMail {
  return compose(
    input.to,
    "Choose a new Spanwright password",
    ["Someone asked to reset the password of the Spanwright account for this address."],
    { label: "Choose a new password", url: input.url },
    "The link works once and for one hour. If you did not ask for it, ignore this message: your password stays as it is.",
  );
}

export function reviewRequestMail(input: {
  to: string;
  crewName: string;
  riggerName: string;
  rigName: string;
  revisionNumber: number;
  note: string;
  url: string;
}): OutgoingMail {
  return compose(
    input.to,
    `Review ${input.rigName} (revision ${input.revisionNumber}) for ${input.crewName}`,
    [
      `${input.riggerName} has submitted revision ${input.revisionNumber} of ${input.rigName} for review in ${input.crewName}.`,
      ...(input.note ? [`Their note: “${input.note}”`] : []),
      "Check its inputs and figures against the site and the gear, then sign it off or return it with your comments.",
    ],
    { label: "Review the rig", url: input.url },
    "You receive this as a lead or owner of the crew. Nobody should walk the line before it is signed off.",
  );
}
