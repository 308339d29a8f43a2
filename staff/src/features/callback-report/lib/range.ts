import { useSearchParams } from "react-router-dom";
import { isValidIsoDate } from "#shared/engine/index";

export interface DateRange {
  from: string;
  to: string;
}

const pad = (n: number) => String(n).padStart(2, "0");
export const isoOf = (d: Date) => `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())}`;

/**
 * "This season": the calendar year so far. Before March nothing of this year's season
 * has happened yet, so it means last year's whole season instead.
 */
export function thisSeason(today = new Date()): DateRange {
  const year = today.getFullYear();
  if (today.getMonth() < 2) return { from: `${year - 1}-01-01`, to: `${year - 1}-12-31` };
  return { from: `${year}-01-01`, to: isoOf(today) };
}

export function lastSeason(today = new Date()): DateRange {
  const year = thisSeason(today).from.slice(0, 4);
  const previous = Number(year) - 1;
  return { from: `${previous}-01-01`, to: `${previous}-12-31` };
}

export function lastTwelveMonths(today = new Date()): DateRange {
  const start = new Date(today);
  start.setFullYear(start.getFullYear() - 1);
  start.setDate(start.getDate() + 1);
  return { from: isoOf(start), to: isoOf(today) };
}

/** The report's range lives in the address (bookmarkable); without one it is this season. */
export function useReportRange(): [DateRange, (range: DateRange) => void] {
  const [params, setParams] = useSearchParams();
  const from = params.get("from");
  const to = params.get("to");
  const range = from && to && isValidIsoDate(from) && isValidIsoDate(to) && from <= to ? { from, to } : thisSeason();
  return [range, (next) => setParams({ from: next.from, to: next.to })];
}
