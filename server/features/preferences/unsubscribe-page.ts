import { escapeHtml } from "../../messaging/escape-html.ts";

/** Tiny stand-alone pages for the unsubscribe link (no app bundle, works in any mail client's browser). */
const page = (body: string) => `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1"><title>Reminder e-mails</title></head>
<body style="font-family:Arial,Helvetica,sans-serif;max-width:480px;margin:48px auto;padding:0 16px;color:#1f2a1c">${body}</body></html>`;

export const unsubscribeFormPage = (action: string) =>
  page(`<h1 style="font-size:22px">Stop reminder e-mails?</h1>
<p>You will get no more lawn care reminder e-mails. You can turn them back on in your care plan's settings.</p>
<form method="post" action="${escapeHtml(action)}"><input type="hidden" name="List-Unsubscribe" value="One-Click">
<button type="submit" style="background:#2f6b2a;color:#fff;border:0;border-radius:6px;padding:10px 16px;font-size:16px">Stop reminder e-mails</button></form>`);

export const unsubscribeDonePage = () =>
  page(`<h1 style="font-size:22px">You're unsubscribed</h1><p>We won't send you reminder e-mails any more. You can turn them back on in your care plan's settings.</p>`);
