/**
 * Finds web-page markup or script hidden in an uploaded photo: a "polyglot" file whose bytes
 * are a real image and also something a browser or PHP would run (a JPEG comment holding
 * `<script>`, `<?php … ?>` appended after the image, `GIF89a/*…*\/=alert(1)`).
 *
 * Why refuse when we re-encode anyway: the copies we keep are made from pixels only, so none
 * of this could survive into them. But the original bytes must never be stored or served as
 * something a browser could interpret, and the security review asked for such uploads to be
 * refused outright rather than quietly cleaned. This is a backstop behind re-encoding,
 * `nosniff` and random storage keys, not a replacement: a list of markers never names every
 * trick (nor does it look for UTF-16 text).
 *
 * False positives matter as much: compressed image data, and the motion-photo video some
 * phones append after the JPEG end marker, look like random bytes. So each marker is specific
 * enough (43 bits or more) that all of them together turn up by chance in about two of a
 * million random uploads of the largest allowed size (15 MB), one in two million at a phone
 * photo's 3 MB; the short tags `<svg`, `<html` and `<body` must be followed by a run of text
 * for that. Markup real photos do carry is not a marker (XMP packets: `<?xpacket`,
 * `<x:xmpmeta`, `<rdf:RDF`), and bytes after the image are never refused just for being
 * there. Pure: no I/O.
 */

export type EmbeddedCode = { marker: string; offset: number };

/** HTML ends a tag name at whitespace, `/` or `>`. */
const tagEnd = String.raw`[\t\n\f\r />]`;
/** Eight bytes of text: markup goes on as text, random bytes rarely do. */
const textRun = String.raw`[\t\n\f\r\x20-\x7e]{8}`;
/** The event handlers XSS payloads use most; a list, because a generic `on…=` turns up in random bytes. */
const handlers = [
  "load", "error", "click", "dblclick", "mouseover", "mouseenter", "focus", "focusin", "blur",
  "begin", "pageshow", "toggle", "animationstart", "transitionend", "pointerover", "input",
];

/** Matched case-insensitively against the bytes read as Latin-1 (one character per byte). */
export const codeMarkers: readonly { marker: string; pattern: string }[] = [
  { marker: "<script", pattern: `<script${tagEnd}` },
  { marker: "<iframe", pattern: `<iframe${tagEnd}` },
  { marker: "<object", pattern: `<object${tagEnd}` },
  { marker: "<embed", pattern: `<embed${tagEnd}` },
  { marker: "<html", pattern: `<html${tagEnd}${textRun}` },
  { marker: "<body", pattern: `<body${tagEnd}${textRun}` },
  { marker: "<svg", pattern: `<svg${tagEnd}${textRun}` },
  { marker: "<?php", pattern: String.raw`<\?php[\t\n\r ]` },
  { marker: "javascript:", pattern: "javascript:" },
  // Not when part of a longer name (`xmp:onload` is no handler).
  { marker: "on…= event handler", pattern: String.raw`(?<![a-z0-9_:.-])on(?:${handlers.join("|")})[\t\n\f\r ]{0,1024}=` },
];

const markerPattern = new RegExp(codeMarkers.map((m) => `(${m.pattern})`).join("|"), "i");

/*
 * Read in small windows rather than as one string: a 15 MB upload would otherwise become a
 * 15 MB string per photo, which lingers until a full garbage collection (the photo benchmark's
 * peak memory rose by a quarter). Windows overlap by more than the longest possible match (a
 * handler with up to 1 KiB of spaces before its "="), so nothing straddling two is missed.
 */
export const scanWindow = { bytes: 64 * 1024, overlapBytes: 2048 } as const;

function findMarker(bytes: Buffer): EmbeddedCode | undefined {
  const { bytes: windowBytes, overlapBytes } = scanWindow;
  for (let start = 0; start < bytes.length; start += windowBytes - overlapBytes) {
    // One byte before the window, so "not part of a longer name" can look behind its start.
    const from = Math.max(0, start - 1);
    const match = markerPattern.exec(bytes.toString("latin1", from, Math.min(bytes.length, start + windowBytes)));
    if (match) {
      const group = match.findIndex((m, i) => i > 0 && m !== undefined);
      return { marker: codeMarkers[group - 1]!.marker, offset: from + match.index };
    }
    if (start + windowBytes >= bytes.length) break;
  }
  return undefined;
}

const SLASH = 0x2f;
const STAR = 0x2a;
const BACKSLASH = 0x5c;
const LF = 0x0a;
const CR = 0x0d;

/** Outside comments and strings, script source is text: no control bytes besides whitespace. */
const isCodeByte = (b: number) => (b >= 0x20 && b !== 0x7f) || (b >= 0x09 && b <= 0x0d);

function endOfLine(bytes: Buffer, from: number): number {
  let i = from;
  while (i < bytes.length && bytes[i] !== LF && bytes[i] !== CR) i += 1;
  return i;
}

/** Index after the closing quote or backtick, or -1 if the string never closes. */
function endOfString(bytes: Buffer, from: number): number {
  const quote = bytes[from];
  for (let i = from + 1; i < bytes.length; i += 1) {
    const b = bytes[i];
    if (b === BACKSLASH) i += 1;
    else if (b === quote) return i + 1;
    else if (quote !== 0x60 && (b === LF || b === CR)) return -1;
  }
  return -1;
}

/**
 * Would a browser's script parser read the whole file as JavaScript? That is how image/script
 * polyglots work: the image header reads as a name (`GIF89a`, or `ÿØÿà` for a JPEG loaded as
 * Latin-1), a comment swallows the binary, then code (`*\/=alert(1)`). An ordinary image fails
 * within a few bytes: its header holds control bytes outside any comment (a PNG's signature
 * always does). A lexer, not a parser: comments, strings and templates are enough to hide binary.
 */
export function readsAsScript(bytes: Buffer): boolean {
  let i = 0;
  while (i < bytes.length) {
    const b = bytes[i]!;
    const next = bytes[i + 1];
    if (b === SLASH && next === STAR) {
      const end = bytes.indexOf("*/", i + 2, "latin1");
      if (end < 0) return false;
      i = end + 2;
    } else if ((b === SLASH && next === SLASH) || (b === 0x3c && bytes.toString("latin1", i, i + 4) === "<!--")) {
      // `<!--` starts a line comment in a classic script too.
      i = endOfLine(bytes, i);
    } else if (b === 0x22 || b === 0x27 || b === 0x60) {
      i = endOfString(bytes, i);
      if (i < 0) return false;
    } else if (isCodeByte(b)) {
      i += 1;
    } else {
      return false;
    }
  }
  return bytes.length > 0;
}

/** The first sign of markup or script in the file, or undefined for an ordinary photo. */
export function findEmbeddedCode(bytes: Buffer): EmbeddedCode | undefined {
  if (readsAsScript(bytes)) return { marker: "the whole file reads as JavaScript", offset: 0 };
  return findMarker(bytes);
}
