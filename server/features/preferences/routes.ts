import { z } from "zod";
import { contactChangeSchema, preferencesSchema, type PreferencesResponse } from "#shared/schemas/preferences";
import type { AppDeps } from "../../app.ts";
import type { Db } from "../../db.ts";
import { HttpError, notFound } from "../../http/errors.ts";
import { route, type RouteSpec } from "../../http/route.ts";
import { reconcileCustomerReminders } from "../reminders/reconcile.ts";
import { UNSUBSCRIBE_PATH, verifyUnsubscribeToken } from "../reminders/unsubscribe.ts";
import { confirmContactChange, requestContactChange } from "./contact-change.ts";
import { customerContacts, loadPreferences, optedOutChannels, optIn, optOut, savePreferences } from "./repo.ts";
import { unsubscribeDonePage, unsubscribeFormPage } from "./unsubscribe-page.ts";

const tokenSchema = z.object({ token: z.string().trim().min(20).max(200) });
const unsubscribeQuerySchema = z.object({ c: z.coerce.number().int().positive(), t: z.string().min(20).max(100) });

async function preferencesResponse(db: Db, customerId: number): Promise<PreferencesResponse> {
  const contacts = await customerContacts(db, customerId);
  if (!contacts) throw notFound("Your customer record");
  return {
    preferences: await loadPreferences(db, customerId, contacts),
    contact: { email: contacts.email, phone: contacts.phone },
    optedOut: await optedOutChannels(db, customerId),
  };
}

const customerIdOf = (user: { customerId: number | null }) => {
  if (user.customerId === null) throw notFound("Your customer record");
  return user.customerId;
};

export function preferencesRoutes(deps: AppDeps): RouteSpec[] {
  const { db, config } = deps;
  const portalResult = (outcome: string) => `/portal/preferences?contact=${outcome}`;
  return [
    route({
      method: "get",
      path: "/api/my/preferences",
      access: ["customer"],
      handler: async ({ user }) => preferencesResponse(db, customerIdOf(user)),
    }),
    route({
      method: "put",
      path: "/api/my/preferences",
      access: ["customer"],
      body: preferencesSchema,
      handler: async ({ user, body }) => {
        const customerId = customerIdOf(user);
        await db.transaction(async (trx) => {
          await savePreferences(trx, customerId, body);
          // Choosing e-mail again in the portal, signed in, is an explicit opt-in. Texts resume only
          // with START from the phone: the carrier keeps blocking them until then anyway.
          if (body.channels === "email" || body.channels === "both") await optIn(trx, customerId, "email", "portal");
          await reconcileCustomerReminders(trx, customerId);
        });
        return preferencesResponse(db, customerId);
      },
    }),
    route({
      method: "post",
      path: "/api/my/contact",
      access: ["customer"],
      body: contactChangeSchema,
      handler: async ({ user, body, res }) => {
        const pending = await requestContactChange(deps, customerIdOf(user), body);
        res.status(202).json({ pending });
      },
    }),
    // The link in the confirmation message. Whoever opens it proves they receive mail or texts at the new
    // address, which is all the confirmation is for, so it needs no session and a GET may apply it.
    route({
      method: "get",
      path: "/api/my/contact/confirm",
      access: "public",
      query: tokenSchema,
      handler: async ({ query, res }) => {
        try {
          await confirmContactChange(db, query.token);
          res.redirect(303, portalResult("confirmed"));
        } catch (error) {
          if (!(error instanceof HttpError)) throw error;
          res.redirect(303, portalResult(error.code));
        }
      },
    }),
    route({
      method: "post",
      path: "/api/my/contact/confirm",
      access: "public",
      body: tokenSchema,
      handler: async ({ body }) => {
        const applied = await confirmContactChange(db, body.token);
        return { applied: { kind: applied.kind, value: applied.value } };
      },
    }),
    // RFC 8058 one-click unsubscribe: mail providers POST "List-Unsubscribe=One-Click" to the header's URL.
    // A GET (a person clicking the link in the e-mail, or a link scanner) only shows a confirm button.
    route({
      method: "get",
      path: UNSUBSCRIBE_PATH,
      access: "public",
      query: unsubscribeQuerySchema,
      handler: async ({ query, res }) => {
        if (!verifyUnsubscribeToken(config.SESSION_SECRET, query.c, query.t)) throw new HttpError(404, "not_found", "This unsubscribe link is not valid.");
        res.type("html").send(unsubscribeFormPage(`${UNSUBSCRIBE_PATH}?c=${query.c}&t=${encodeURIComponent(query.t)}`));
      },
    }),
    route({
      method: "post",
      path: UNSUBSCRIBE_PATH,
      access: "public",
      query: unsubscribeQuerySchema,
      handler: async ({ query, res }) => {
        if (!verifyUnsubscribeToken(config.SESSION_SECRET, query.c, query.t)) throw new HttpError(404, "not_found", "This unsubscribe link is not valid.");
        await db.transaction(async (trx) => {
          if (!(await trx("customers").where({ id: query.c }).first("id"))) return;
          await optOut(trx, query.c, "email", "email_one_click");
          await reconcileCustomerReminders(trx, query.c);
        });
        res.type("html").send(unsubscribeDonePage());
      },
    }),
  ];
}
