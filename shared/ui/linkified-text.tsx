import { Fragment } from "react";

// Stops at whitespace, quotes and brackets so "(see https://x.y/z)." links only the address.
const urlPattern = /https?:\/\/[^\s<>"'()[\]{}]+/g;
const trailingPunctuation = /[.,;:!?]+$/;

/** Returns the URL when it is a well-formed http(s) address, else null (no javascript: or data: links). */
export function safeHttpUrl(candidate: string): string | null {
  try {
    const url = new URL(candidate);
    return url.protocol === "http:" || url.protocol === "https:" ? url.href : null;
  } catch {
    return null;
  }
}

export interface TextPart {
  text: string;
  /** Set when this part is an http(s) address. */
  href?: string;
}

/** Splits plain text into text and http(s) link parts, in order. */
export function splitLinks(text: string): TextPart[] {
  const parts: TextPart[] = [];
  let last = 0;
  for (const match of text.matchAll(urlPattern)) {
    const raw = match[0].replace(trailingPunctuation, "");
    const href = safeHttpUrl(raw);
    if (!href) continue;
    if (match.index > last) parts.push({ text: text.slice(last, match.index) });
    parts.push({ text: raw, href });
    last = match.index + raw.length;
  }
  if (last < text.length) parts.push({ text: text.slice(last) });
  return parts;
}

/**
 * Plain text with its http(s) addresses turned into links. React escapes every piece,
 * so message bodies are never injected as HTML.
 */
export function LinkifiedText({ text, className = "" }: { text: string; className?: string }) {
  return (
    <p className={`whitespace-pre-wrap [overflow-wrap:anywhere] ${className}`}>
      {splitLinks(text).map((part, index) =>
        part.href ? (
          <a key={index} href={part.href}>
            {part.text}
          </a>
        ) : (
          <Fragment key={index}>{part.text}</Fragment>
        ),
      )}
    </p>
  );
}
