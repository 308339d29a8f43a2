import { z } from "zod";

/*
 * Where a portal link opened signed out should land after sign-in ("?next="). Only a path inside
 * the homeowner portal on this same site is accepted: never another host ("//evil.example",
 * "https://…", "/\\evil"), never the staff app, and never the sign-in pages themselves (a loop).
 * The path is judged after the browser's own normalisation, so "/portal/../staff" is refused too.
 */
const PORTAL = "/portal";
const probeOrigin = "https://portal.invalid";

/** The normalised "/portal/…" path (with its query and fragment), or null when it is not a safe target. */
export function safePortalNext(raw: string | null | undefined): string | null {
  if (!raw || raw.length > 512) return null;
  // Only a plain absolute path: "//host", "/\host" and any scheme are other sites to a browser.
  if (!raw.startsWith("/") || raw.startsWith("//") || raw.includes("\\")) return null;
  if ([...raw].some((ch) => ch.charCodeAt(0) < 0x20 || ch.charCodeAt(0) === 0x7f)) return null;
  let url: URL;
  try {
    url = new URL(raw, probeOrigin);
  } catch {
    return null;
  }
  if (url.origin !== probeOrigin) return null;
  if (url.pathname !== PORTAL && !url.pathname.startsWith(`${PORTAL}/`)) return null;
  if (url.pathname === `${PORTAL}/sign-in` || url.pathname.startsWith(`${PORTAL}/sign-in/`)) return null;
  return `${url.pathname}${url.search}${url.hash}`;
}

/** The same path inside the portal's router (whose basename is /portal). */
export function portalRouterPath(next: string): string {
  const inside = next.slice(PORTAL.length);
  return inside.startsWith("/") ? inside : `/${inside}`;
}

/** `next` as an API field: accepted only when safe, and sent on normalised. */
export const portalNextSchema = z.string().max(512).transform((raw, ctx) => {
  const safe = safePortalNext(raw);
  if (safe === null) {
    ctx.addIssue({ code: "custom", message: "Not a page of the homeowner portal" });
    return z.NEVER;
  }
  return safe;
});
