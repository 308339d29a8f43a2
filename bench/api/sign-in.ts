/** Signs people in over HTTP for load tests, returning session cookies. */
import { createHmac } from "node:crypto";
import type { Knex } from "knex";
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

/**
 * Many signed-in homeowners at once, from the sessions the bench data holds (one per homeowner),
 * with the cookie express-session would have set: "s:" + id + "." + HMAC-SHA256 of the id
 * (base64, no padding), as cookie-signature makes it. Load spread over them reads as many
 * homeowners do, each with a session and a plan of their own.
 */
export async function benchHomeowners(db: Knex, secret: string, count: number): Promise<{ cookie: string; planId: number }[]> {
  // The generated sessions last 30 days from generation; data is reused across runs.
  await db("sessions").where("sid", "like", "bench-%").update({ expire: db.raw("now() + interval '30 days'") });
  const rows = await db("sessions as s")
    .join("customers as c", "c.user_id", db.raw("(s.sess #>> '{passport,user}')::int"))
    .join("properties as p", "p.customer_id", "c.id")
    .join("care_plans as cp", "cp.property_id", "p.id")
    .where("s.sid", "like", "bench-%")
    .orderByRaw("md5(s.sid)")
    .limit(count)
    .select<{ sid: string; plan_id: number }[]>("s.sid", "cp.id as plan_id");
  return rows.map(({ sid, plan_id }) => {
    const signature = createHmac("sha256", secret).update(sid).digest("base64").replace(/=+$/, "");
    return { cookie: `sproutline.sid=${encodeURIComponent(`s:${sid}.${signature}`)}`, planId: plan_id };
  });
}
