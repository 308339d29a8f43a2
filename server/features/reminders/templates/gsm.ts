/*
 * SMS length. A text in the GSM 03.38 alphabet ("GSM-7") fits 160 characters in one segment and
 * 153 per segment once split; one character outside it makes the whole text UCS-2 (70 / 67), so a
 * single curly apostrophe can triple the cost. Reminder texts are therefore normalised to GSM-7
 * before they are measured and trimmed. Characters of the extension table take two septets.
 */

const GSM_BASIC =
  "@£$¥èéùìòÇ\nØø\rÅåΔ_ΦΓΛΩΠΨΣΘΞÆæßÉ !\"#¤%&'()*+,-./0123456789:;<=>?¡ABCDEFGHIJKLMNOPQRSTUVWXYZÄÖÑÜ§¿abcdefghijklmnopqrstuvwxyzäöñüà";
const GSM_EXTENSION = "^{}\\[~]|€\f";
const basic = new Set(GSM_BASIC);
const extension = new Set(GSM_EXTENSION);

const REPLACEMENTS: Record<string, string> = {
  "\u2018": "'", "\u2019": "'", "\u201A": "'", "\u201B": "'", "\u2032": "'",
  "\u201C": '"', "\u201D": '"', "\u201E": '"', "\u2033": '"',
  "\u2013": "-", "\u2014": "-", "\u2212": "-", "\u2010": "-", "\u2011": "-",
  "\u2026": "...", "\u00BD": "1/2", "\u00BC": "1/4", "\u00BE": "3/4", "\u2153": "1/3", "\u2154": "2/3",
  "\u00B0": " deg", "\u00B2": "2", "\u00B3": "3", "\u00D7": "x", "\u2022": "-", "\u00B7": "-",
  "\u00A0": " ", "\u2009": " ", "\u202F": " ", "\u2002": " ", "\u2003": " ", "\t": " ",
};

export function isGsm7(text: string): boolean {
  for (const ch of text) if (!basic.has(ch) && !extension.has(ch)) return false;
  return true;
}

/** Rewrites text into GSM-7: typographic punctuation to plain, accents dropped where GSM lacks the letter, anything else removed. */
export function toGsm7(text: string): string {
  let out = "";
  for (const ch of text) {
    if (basic.has(ch) || extension.has(ch)) {
      out += ch;
      continue;
    }
    const replaced = REPLACEMENTS[ch];
    if (replaced !== undefined) {
      out += replaced;
      continue;
    }
    // "á" → "a": decompose and keep the base letter when GSM has it.
    const base = ch.normalize("NFD").replace(/\p{M}/gu, "");
    if (base && [...base].every((c) => basic.has(c))) out += base;
  }
  return out;
}

export type SmsLength = { encoding: "GSM-7" | "UCS-2"; units: number; segments: number };

export function smsLength(text: string): SmsLength {
  if (isGsm7(text)) {
    let units = 0;
    for (const ch of text) units += extension.has(ch) ? 2 : 1;
    return { encoding: "GSM-7", units, segments: units <= 160 ? 1 : Math.ceil(units / 153) };
  }
  // UTF-16 code units: characters outside the BMP take two.
  const units = text.length;
  return { encoding: "UCS-2", units, segments: units <= 70 ? 1 : Math.ceil(units / 67) };
}

/** Septets available in `segments` GSM-7 segments. */
export const gsm7Capacity = (segments: number) => (segments <= 1 ? 160 : segments * 153);
