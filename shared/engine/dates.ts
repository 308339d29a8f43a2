/*
 * Plan dates are calendar dates in the property's own zone ("YYYY-MM-DD").
 * All arithmetic is done on whole day numbers (days since 1970-01-01 in the
 * proleptic Gregorian calendar) and never through `Date` objects, so a DST
 * change, the server's zone or UTC can never push a step onto the wrong day.
 * Algorithms: Howard Hinnant, "chrono-Compatible Low-Level Date Algorithms".
 */

export type IsoDate = string;

const ISO_DATE = /^(\d{4})-(\d{2})-(\d{2})$/;
const LOCAL_TIME = /^([01]\d|2[0-3]):([0-5]\d)$/;

export function isLeapYear(year: number): boolean {
  return (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0;
}

export function daysInMonth(year: number, month: number): number {
  if (month === 2) return isLeapYear(year) ? 29 : 28;
  return month === 4 || month === 6 || month === 9 || month === 11 ? 30 : 31;
}

export function isValidIsoDate(value: unknown): value is IsoDate {
  if (typeof value !== "string") return false;
  const match = ISO_DATE.exec(value);
  if (!match) return false;
  const month = Number(match[2]);
  const day = Number(match[3]);
  return month >= 1 && month <= 12 && day >= 1 && day <= daysInMonth(Number(match[1]), month);
}

export function daysFromCivil(year: number, month: number, day: number): number {
  const y = month <= 2 ? year - 1 : year;
  const era = Math.floor(y / 400);
  const yearOfEra = y - era * 400;
  const dayOfYear = Math.floor((153 * (month + (month > 2 ? -3 : 9)) + 2) / 5) + day - 1;
  const dayOfEra = yearOfEra * 365 + Math.floor(yearOfEra / 4) - Math.floor(yearOfEra / 100) + dayOfYear;
  return era * 146097 + dayOfEra - 719468;
}

export function civilFromDays(dayNumber: number): { year: number; month: number; day: number } {
  const z = dayNumber + 719468;
  const era = Math.floor(z / 146097);
  const dayOfEra = z - era * 146097;
  const yearOfEra = Math.floor(
    (dayOfEra - Math.floor(dayOfEra / 1460) + Math.floor(dayOfEra / 36524) - Math.floor(dayOfEra / 146096)) / 365,
  );
  const dayOfYear = dayOfEra - (365 * yearOfEra + Math.floor(yearOfEra / 4) - Math.floor(yearOfEra / 100));
  const mp = Math.floor((5 * dayOfYear + 2) / 153);
  const day = dayOfYear - Math.floor((153 * mp + 2) / 5) + 1;
  const month = mp < 10 ? mp + 3 : mp - 9;
  return { year: yearOfEra + era * 400 + (month <= 2 ? 1 : 0), month, day };
}

/*
 * Parsing by character codes, not the ISO_DATE regex: this runs for every date
 * of every plan. Same acceptance as the regex: exactly "dddd-dd-dd", ASCII digits.
 */
const DIGIT_0 = 48;
const DASH = 45;

/** Digits of "dddd-dd-dd" as one number yyyymmdd (ordered as the text is), or -1 for anything else. */
export function isoDigits(text: string): number {
  if (text.length !== 10 || text.charCodeAt(4) !== DASH || text.charCodeAt(7) !== DASH) return -1;
  let value = 0;
  for (let i = 0; i < 10; i++) {
    if (i === 4 || i === 7) continue;
    const digit = text.charCodeAt(i) - DIGIT_0;
    if (digit < 0 || digit > 9) return -1;
    value = value * 10 + digit;
  }
  return value;
}

/** Throws on malformed input: callers pass dates that zod has already checked. */
export function toDayNumber(date: IsoDate): number {
  const digits = isoDigits(date);
  if (digits >= 0) {
    const year = Math.floor(digits / 10_000);
    const month = Math.floor(digits / 100) % 100;
    const day = digits % 100;
    if (month >= 1 && month <= 12 && day >= 1 && day <= daysInMonth(year, month)) return daysFromCivil(year, month, day);
  }
  throw new RangeError(`Not a calendar date: ${date}`);
}

const pad2 = (n: number) => (n < 10 ? `0${n}` : String(n));

/*
 * Plans reuse the same few thousand dates, so their texts are memoised
 * (pure, since a day number always names the same date). Days of 2000–2099
 * sit in an array indexed by day number (cheaper than a Map lookup); others
 * in a bounded Map.
 */
const FIRST_ARRAY_DAY = 10_957; // 2000-01-01
const ARRAY_DAYS = 36_525; // through 2099-12-31
const isoTextByArrayDay: (IsoDate | undefined)[] = new Array<IsoDate | undefined>(ARRAY_DAYS);
const isoTextByDay = new Map<number, IsoDate>();
const MAX_MEMOISED_DATES = 100_000;

function isoText(dayNumber: number): IsoDate {
  const { year, month, day } = civilFromDays(dayNumber);
  return `${String(year).padStart(4, "0")}-${pad2(month)}-${pad2(day)}`;
}

export function fromDayNumber(dayNumber: number): IsoDate {
  const index = dayNumber - FIRST_ARRAY_DAY;
  if (index >= 0 && index < ARRAY_DAYS && Number.isInteger(index)) {
    return isoTextByArrayDay[index] ?? (isoTextByArrayDay[index] = isoText(dayNumber));
  }
  let text = isoTextByDay.get(dayNumber);
  if (text === undefined) {
    text = isoText(dayNumber);
    if (isoTextByDay.size < MAX_MEMOISED_DATES) isoTextByDay.set(dayNumber, text);
  }
  return text;
}

export function addDays(date: IsoDate, days: number): IsoDate {
  return fromDayNumber(toDayNumber(date) + days);
}

/** Whole calendar days from `from` to `to` (positive when `to` is later). */
export function daysBetween(from: IsoDate, to: IsoDate): number {
  return toDayNumber(to) - toDayNumber(from);
}

export function monthOfDayNumber(dayNumber: number): number {
  return civilFromDays(dayNumber).month;
}

export function isValidLocalTime(value: unknown): value is string {
  return typeof value === "string" && LOCAL_TIME.test(value);
}

/** Throws unless `time` is "HH:MM" (00:00–23:59), as LOCAL_TIME accepts; parsed by character codes, once per start time per plan. */
export function minutesOfLocalTime(time: string): number {
  if (time.length === 5 && time.charCodeAt(2) === 58) {
    const h1 = time.charCodeAt(0) - DIGIT_0;
    const h2 = time.charCodeAt(1) - DIGIT_0;
    const m1 = time.charCodeAt(3) - DIGIT_0;
    const m2 = time.charCodeAt(4) - DIGIT_0;
    const digits = h1 >= 0 && h1 <= 9 && h2 >= 0 && h2 <= 9 && m1 >= 0 && m1 <= 5 && m2 >= 0 && m2 <= 9;
    const hour = h1 * 10 + h2;
    if (digits && hour <= 23) return hour * 60 + m1 * 10 + m2;
  }
  throw new RangeError(`Not a local time: ${time}`);
}

export function localTimeFromMinutes(minutes: number): string {
  return `${pad2(Math.floor(minutes / 60))}:${pad2(minutes % 60)}`;
}
