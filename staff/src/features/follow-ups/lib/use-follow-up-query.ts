import { useSearchParams } from "react-router-dom";
import { followUpListQuerySchema, type FollowUpListQuery } from "#shared/schemas/follow-ups";

export const PAGE_SIZE = 25;

/**
 * The table's filters, sort and page live in the address, so a filtered view can be
 * bookmarked or shared and Back goes to the previous view. Anything unreadable in the
 * address is dropped rather than breaking the page.
 */
export function useFollowUpQuery() {
  const [params, setParams] = useSearchParams();
  const raw: Record<string, string> = { limit: String(PAGE_SIZE), ...Object.fromEntries(params) };
  const query = parseLeniently(raw);

  /** Changes some values; any change other than the page goes back to the first page. */
  const update = (changes: Partial<Record<keyof FollowUpListQuery, string | number | boolean | undefined>>) => {
    const next = new URLSearchParams(params);
    for (const [key, value] of Object.entries(changes)) {
      if (value === undefined || value === "") next.delete(key);
      else next.set(key, String(value));
    }
    if (!("offset" in changes)) next.delete("offset");
    setParams(next);
  };

  return { query, update, reset: () => setParams(new URLSearchParams()) };
}

function parseLeniently(raw: Record<string, string>): FollowUpListQuery {
  const first = followUpListQuerySchema.safeParse(raw);
  if (first.success) return first.data;
  const bad = new Set(first.error.issues.map((issue) => String(issue.path[0])));
  const kept = Object.fromEntries(Object.entries(raw).filter(([key]) => !bad.has(key)));
  return followUpListQuerySchema.parse(kept);
}
