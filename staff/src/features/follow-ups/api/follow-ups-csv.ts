import type { FollowUpFilter } from "#shared/schemas/follow-ups";
import { followUpSearch } from "./get-follow-ups.ts";

/**
 * The CSV export of the filtered follow-ups. A plain link rather than a query: the browser
 * downloads it with the session cookie and names the file from the server's header.
 */
export function followUpsCsvHref(filter: Partial<FollowUpFilter>): string {
  const search = followUpSearch(filter);
  return search ? `/api/follow-ups.csv?${search}` : "/api/follow-ups.csv";
}
