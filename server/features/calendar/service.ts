import type { Db } from "../../db.ts";
import { buildFeed } from "./build-feed.ts";
import { hashFeedToken, isFeedTokenShaped, newFeedToken, openFeedToken, sealFeedToken } from "./feed-token.ts";
import * as repo from "./repo.ts";

export type CalendarDeps = { db: Db; secret: string; publicUrl: string };

const feedUrl = (deps: CalendarDeps, token: string) => `${deps.publicUrl.replace(/\/$/, "")}/calendar/${token}.ics`;

/**
 * Issues a feed link. Runs under a lock on the customer row, so two processes (or a
 * double click) cannot both create one; without `replace`, a live link found under the lock
 * is returned instead of making another.
 */
async function issueFeed(deps: CalendarDeps, customerId: number, replace: boolean): Promise<string> {
  return deps.db.transaction(async (trx) => {
    await repo.lockCustomer(trx, customerId);
    if (!replace) {
      const existing = await repo.findActiveFeed(trx, customerId);
      const token = existing && openFeedToken(deps.secret, existing.token_sealed);
      if (token) return feedUrl(deps, token);
    }
    await repo.revokeActiveFeeds(trx, customerId);
    const token = newFeedToken();
    await repo.insertFeed(trx, customerId, hashFeedToken(token), sealFeedToken(deps.secret, token));
    return feedUrl(deps, token);
  });
}

/** The customer's feed link, made on first request. */
export async function getFeedUrl(deps: CalendarDeps, customerId: number): Promise<string> {
  const existing = await repo.findActiveFeed(deps.db, customerId);
  const token = existing && openFeedToken(deps.secret, existing.token_sealed);
  if (token) return feedUrl(deps, token);
  // None yet, or sealed under an earlier SESSION_SECRET: that link cannot be shown again, so
  // a new one replaces it.
  return issueFeed(deps, customerId, existing !== undefined);
}

/** A new link; the old one stops working at once. */
export function rotateFeed(deps: CalendarDeps, customerId: number): Promise<string> {
  return issueFeed(deps, customerId, true);
}

/** The feed's iCalendar text, or undefined for a token that is unknown, rotated or malformed. */
export async function renderFeed(deps: CalendarDeps, token: string): Promise<string | undefined> {
  if (!isFeedTokenShaped(token)) return undefined;
  const owner = await repo.findFeedOwner(deps.db, hashFeedToken(token));
  if (!owner) return undefined;
  const [{ plans, steps }, visits] = await Promise.all([repo.loadFeedPlans(deps.db, owner.customerId), repo.loadFeedVisits(deps.db, owner.customerId)]);
  return buildFeed({ companyName: owner.companyName, plans, steps, visits });
}
