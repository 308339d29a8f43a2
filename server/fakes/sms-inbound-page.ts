import { escapeHtml, renderPage } from "./html-page.ts";
import type { InboundResult } from "./sms-inbound.ts";

const BANNER = "Local test tool: fake SMS gateway. Nothing here reaches a real phone.";

/** A form to play the customer and text the app by hand. */
export function renderInboundForm(options: { to: string; webhookUrl: string | null; from?: string; error?: string }): string {
  const target = options.webhookUrl
    ? `<p>Replies are posted, signed, to <code>${escapeHtml(options.webhookUrl)}</code>.</p>`
    : `<p class="error">No inbound webhook URL is set. Start the fakes with FAKE_SMS_INBOUND_WEBHOOK_URL or POST {"inboundWebhookUrl": "…"} to /__control.</p>`;
  const error = options.error ? `<p class="error" role="alert">${escapeHtml(options.error)}</p>` : "";
  return renderPage(
    "Send a test text message",
    BANNER,
    `<h1>Text the app as a customer</h1>
${target}
${error}
<form method="post" action="/__inbound" enctype="multipart/form-data">
  <label for="from">Customer's mobile number</label>
  <input id="from" name="from" type="tel" required autocomplete="off" placeholder="+15551234567" value="${escapeHtml(options.from ?? "")}">
  <label for="to">Our number</label>
  <input id="to" name="to" type="tel" required value="${escapeHtml(options.to)}">
  <label for="body">Message</label>
  <textarea id="body" name="body" rows="4"></textarea>
  <label for="photo">Photo (optional, sent as MMS media)</label>
  <input id="photo" name="photo" type="file" accept="image/*">
  <label><input name="samplePhoto" type="checkbox" value="on"> Attach a sample lawn photo (JPEG with camera and GPS metadata)</label>
  <p><button class="primary" type="submit">Send text</button></p>
</form>
<p><a href="/__messages">See every recorded message (JSON)</a></p>`,
  );
}

export function renderInboundResult(result: InboundResult, from: string): string {
  const replies = result.replies.length
    ? `<ul>${result.replies.map((r) => `<li>${escapeHtml(r)}</li>`).join("")}</ul>`
    : "<p>No reply message.</p>";
  return renderPage(
    "Test text message sent",
    BANNER,
    `<h1>Text sent</h1>
<p role="status">The app answered with HTTP ${result.webhookStatus}.</p>
<p>Photos attached: ${result.mediaUrls.length}.</p>
<h2>Reply texts</h2>
${replies}
<h2>What the app sent back</h2>
<pre>${escapeHtml(result.twiml || "(empty)")}</pre>
<p><a href="/__inbound?from=${encodeURIComponent(from)}">Send another</a></p>`,
  );
}
