import type { OutgoingEmail, OutgoingSms } from "../../messaging/messenger.ts";
import { escapeHtml } from "../../messaging/escape-html.ts";

export function signInEmail(to: string, firstName: string, companyName: string, link: string, minutes: number): OutgoingEmail {
  const text = [
    `Hello ${firstName},`,
    "",
    `Open this link to see your lawn care plan from ${companyName}:`,
    link,
    "",
    `The link works once and for ${minutes} minutes. If you did not ask for it, you can ignore this message.`,
  ].join("\n");
  const html = `<p>Hello ${escapeHtml(firstName)},</p>
<p>Open this link to see your lawn care plan from ${escapeHtml(companyName)}:</p>
<p><a href="${escapeHtml(link)}">Sign in to your care plan</a></p>
<p>The link works once and for ${minutes} minutes. If you did not ask for it, you can ignore this message.</p>`;
  return { to, subject: `Your sign-in link for ${companyName}`, text, html };
}

/** Names the company (CTIA sender identification) and stays within two SMS segments. */
export function signInSms(to: string, senderName: string, link: string, minutes: number): OutgoingSms {
  return { to, body: `${senderName}: your sign-in link (works once, ${minutes} min): ${link}` };
}
