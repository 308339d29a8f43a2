/** Signs people in over HTTP for load tests, returning session cookies. */
import type { RunningFakes } from "../../server/fakes/index.ts";

export async function homeownerCookie(appUrl: string, fakes: RunningFakes, email: string): Promise<string> {
  const headers = { "content-type": "application/json", origin: appUrl, "x-forwarded-for": "192.0.2.250" };
  const res = await fetch(`${appUrl}/api/auth/link`, { method: "POST", headers, body: JSON.stringify({ contact: email }) });
  if (res.status !== 202) throw new Error(`link request answered ${res.status}`);
  let link: string | undefined;
  for (let i = 0; i < 200 && !link; i++) {
    link = (await fakes.listOutbox()).find((m) => m.to === email)?.links[0];
    if (!link) await new Promise((r) => setTimeout(r, 50));
  }
  if (!link) throw new Error(`no link reached ${email}`);
  const consumed = await fetch(`${appUrl}/api/auth/link/consume`, { method: "POST", headers, body: JSON.stringify({ token: new URL(link).searchParams.get("token") }) });
  return consumed.headers.get("set-cookie")!.split(";")[0]!;
}

/** Follows the Google sign-in redirects through the fake provider by hand. */
export async function staffCookie(appUrl: string, fakes: RunningFakes, email: string): Promise<string> {
  const start = await fetch(`${appUrl}/auth/google`, { redirect: "manual" });
  const preSession = start.headers.get("set-cookie")!.split(";")[0]!;
  const authorize = new URL(start.headers.get("location")!);
  const chosen = await fetch(`${fakes.oauthUrl}${authorize.pathname}`, {
    method: "POST",
    redirect: "manual",
    headers: { "content-type": "application/x-www-form-urlencoded" },
    body: new URLSearchParams({ ...Object.fromEntries(authorize.searchParams), email }),
  });
  const callback = new URL(chosen.headers.get("location")!);
  const done = await fetch(`${appUrl}${callback.pathname}${callback.search}`, { redirect: "manual", headers: { cookie: preSession } });
  if (done.headers.get("location") !== "/staff/") throw new Error(`staff sign-in ended at ${done.headers.get("location")}`);
  return done.headers.get("set-cookie")!.split(";")[0]!;
}

/** The session id inside a signed session cookie ("name=s:<id>.<signature>", URL-encoded). */
export function sessionIdOf(cookie: string): string {
  const value = decodeURIComponent(cookie.slice(cookie.indexOf("=") + 1));
  return value.slice(2, value.lastIndexOf("."));
}
