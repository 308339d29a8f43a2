import { DATE_RANGE_MESSAGE, EARLIEST_DATE, LATEST_DATE } from "#shared/engine/schemas/common";
import { isValidIsoDate } from "#shared/engine/index";

/**
 * Dates as US spreadsheets save them (MM/DD/YYYY, M/D/YYYY, sometimes with a midnight time
 * when the cell was a date-time) or as ISO (YYYY-MM-DD). Slashes are read month first, as
 * in the US; a first number over 12 is explained rather than silently swapped, because a
 * day-first file would otherwise import wrong dates wherever the day is 12 or less.
 */
const ISO = /^(\d{4})-(\d{2})-(\d{2})$/;
const US = /^(\d{1,2})\/(\d{1,2})\/(\d+)(?:\s+0{1,2}:00(?::00)?)?$/;

const MONTHS = ["January", "February", "March", "April", "May", "June", "July", "August", "September", "October", "November", "December"];
const pad = (n: number) => String(n).padStart(2, "0");

export type CellDate = { date: string } | { error: string };

export function readCellDate(text: string): CellDate {
  const value = text.trim();
  const iso = ISO.exec(value);
  const us = iso ? null : US.exec(value);
  if (!iso && !us) return { error: `"${value}" is not a date: write it MM/DD/YYYY (09/08/2026) or YYYY-MM-DD (2026-09-08)` };

  let date: string;
  if (iso) {
    date = value;
  } else {
    const [, m, d, y] = us!;
    if (y!.length <= 2) return { error: `Write the year in full: ${m}/${d}/20${y!.padStart(2, "0")}` };
    if (y!.length !== 4) return { error: `"${value}" is not a date: write the year with four digits` };
    const month = Number(m);
    if (month < 1 || month > 12) {
      return { error: `"${value}": there is no month ${month}. Dates with slashes are read month first (MM/DD/YYYY); ${month <= 31 ? `for day ${month} of month ${Number(d)}, write ${pad(Number(d))}/${pad(month)}/${y}` : "check the cell"}` };
    }
    date = `${y}-${pad(month)}-${pad(Number(d))}`;
  }
  if (!isValidIsoDate(date as unknown)) {
    const month = Number(date.slice(5, 7));
    return { error: month >= 1 && month <= 12 ? `"${value}" is not a date: ${MONTHS[month - 1]} ${date.slice(0, 4)} has no day ${Number(date.slice(8, 10))}` : `"${value}" is not a date: there is no month ${month}` };
  }
  if (date < EARLIEST_DATE || date > LATEST_DATE) return { error: DATE_RANGE_MESSAGE };
  return { date };
}
