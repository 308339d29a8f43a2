import type { OutgoingEmail } from "../../messaging/messenger.ts";
import { escapeHtml } from "../../messaging/escape-html.ts";

const roleWords = { technician: "a technician", manager: "a manager" } as const;

/** The staff invitation: no token, because staff sign in with the Google account of this address. */
export function invitationEmail(to: string, inviterName: string, companyName: string, role: keyof typeof roleWords, signInUrl: string): OutgoingEmail {
  const text = [
    "Hello,",
    "",
    `${inviterName} has added you to ${companyName} on Sproutline as ${roleWords[role]}.`,
    `Sign in with the Google account of this address (${to}):`,
    signInUrl,
  ].join("\n");
  const html = `<p>Hello,</p>
<p>${escapeHtml(inviterName)} has added you to ${escapeHtml(companyName)} on Sproutline as ${roleWords[role]}.</p>
<p>Sign in with the Google account of this address (${escapeHtml(to)}):</p>
<p><a href="${escapeHtml(signInUrl)}">Sign in to the staff app</a></p>`;
  return { to, subject: `You're invited to ${companyName} on Sproutline`, text, html };
}
