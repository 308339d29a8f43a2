/*
 * What the homeowner wrote in an e-mail reply, without the e-mail they replied to and without
 * their signature. Written by hand: the npm packages that do this (email-reply-parser, planer)
 * are not installed here. Works on plain text (mailparser derives it from HTML-only mail).
 *
 * Rules, in order of the lines:
 *  - everything from a quote header on is the earlier e-mail: "On … wrote:" (Gmail, Apple Mail,
 *    possibly wrapped over up to three lines), "El … escribió:" (Spanish), "-----Original Message-----"
 *    / "-----Mensaje original-----", and Outlook's header block ("From:" followed within a few lines
 *    by "Sent:"/"Date:"/"To:"/"Subject:", or the Spanish "De:" … "Enviado:"/"Para:"/"Asunto:");
 *  - lines starting with ">" are quoted text, dropped wherever they are (inline replies keep the
 *    homeowner's own lines between them);
 *  - from a "-- " signature delimiter on, the rest is a signature;
 *  - a phone's "Sent from my iPhone"-style footer line (English and Spanish) and what follows it.
 */

const quoteHeaderJoined = [
  /^On\b.{4,}\bwrote:$/i,
  /^El\b.{4,}\bescribi[óo]:$/i,
];
const originalMessage = /^-{2,}\s*(Original Message|Mensaje original|Forwarded message|Mensaje reenviado)\s*-{2,}$/i;
const outlookFrom = /^\*?(From|De):\*?\s+\S/i;
const outlookField = /^\*?(Sent|Date|To|Subject|Cc|Enviado|Fecha|Para|Asunto|CC):\*?\s/i;
const underscoreRule = /^_{10,}$/;
const signatureDelimiter = /^--\s?$/;
const mobileFooter = [
  /^Sent from my [\w\s.-]{2,40}$/i,
  /^Sent from (Mail|Outlook|Yahoo Mail|Gmail|AOL)\b.{0,40}$/i,
  /^Get Outlook for (iOS|Android)$/i,
  /^Enviado desde mi [\wáéíóúñ\s.-]{2,40}$/i,
  /^Enviado desde (Correo|Outlook|Yahoo Mail|Gmail)\b.{0,40}$/i,
  /^(Obtener|Descargar) Outlook para (iOS|Android)$/i,
];

/** Index of the first line of the quoted earlier e-mail, or -1. */
function quoteStart(lines: readonly string[]): number {
  for (let i = 0; i < lines.length; i++) {
    const line = lines[i]!.trim();
    if (line === "") continue;
    if (/^(On|El)\b/i.test(line)) {
      // Mail clients wrap a long "On <date>, <name> <address> wrote:" line.
      let joined = line;
      for (let j = i; j < Math.min(i + 3, lines.length); j++) {
        if (j > i) joined = `${joined} ${lines[j]!.trim()}`;
        if (quoteHeaderJoined.some((re) => re.test(joined))) return i;
      }
    }
    if (originalMessage.test(line)) return i;
    if (outlookFrom.test(line) && lines.slice(i + 1, i + 5).some((l) => outlookField.test(l.trim()))) {
      // Outlook draws a rule right above its header block; take it too.
      const above = i > 0 ? lines[i - 1]!.trim() : "";
      return underscoreRule.test(above) ? i - 1 : i;
    }
  }
  return -1;
}

export function stripReply(text: string): string {
  let lines = text.replace(/\r\n?/g, "\n").split("\n");

  const quote = quoteStart(lines);
  if (quote >= 0) lines = lines.slice(0, quote);

  lines = lines.filter((line) => !/^\s*>/.test(line));

  const signature = lines.findIndex((line) => signatureDelimiter.test(line.trimEnd()) && line.startsWith("--"));
  if (signature >= 0) lines = lines.slice(0, signature);

  const footer = lines.findIndex((line) => mobileFooter.some((re) => re.test(line.trim())));
  if (footer >= 0) lines = lines.slice(0, footer);

  return lines
    .map((line) => line.trimEnd())
    .join("\n")
    .replace(/\n{3,}/g, "\n\n")
    .trim();
}
