const inchesText = new Map<number, string>();

/** Plain numbers for homeowner text: "3 in", "2.5 in", "2.25 in". Mower heights repeat, so texts are memoised. */
export function formatInches(value: number): string {
  let text = inchesText.get(value);
  if (text === undefined) {
    text = `${Number(value.toFixed(2))} in`;
    if (inchesText.size < 1000) inchesText.set(value, text);
  }
  return text;
}

/*
 * Plans print the same few amounts again and again (depths, rates, areas), so
 * texts are memoised per number of decimals (bounded, pure).
 */
const MAX_MEMOISED_NUMBERS = 4096;
const numberText: Map<number, string>[] = [];

/** "21.4", "6,000": fixed US-style grouping so output never depends on the host's locale. */
export function formatNumber(value: number, decimals = 1): string {
  const memo = numberText[decimals] ?? (Number.isInteger(decimals) && decimals >= 0 && decimals <= 20 ? (numberText[decimals] = new Map()) : undefined);
  let text = memo?.get(value);
  if (text === undefined) {
    text = groupedNumber(value, decimals);
    if (memo && memo.size < MAX_MEMOISED_NUMBERS) memo.set(value, text);
  }
  return text;
}

function groupedNumber(value: number, decimals: number): string {
  const text = String(Number(value.toFixed(decimals)));
  const dot = text.indexOf(".");
  const whole = dot === -1 ? text : text.slice(0, dot);
  const sign = whole.startsWith("-") ? "-" : "";
  const digits = sign ? whole.slice(1) : whole;
  let grouped = "";
  for (let i = 0; i < digits.length; i++) {
    if (i > 0 && (digits.length - i) % 3 === 0) grouped += ",";
    grouped += digits[i];
  }
  return sign + grouped + (dot === -1 ? "" : text.slice(dot));
}

export function plural(count: number, one: string, many: string): string {
  return count === 1 ? one : many;
}

const MONTHS = ["January", "February", "March", "April", "May", "June", "July", "August", "September", "October", "November", "December"];

/** "October 15": month first as US readers expect, without Intl so it never depends on the host. */
export function formatDate(date: string): string {
  const month = Number(date.slice(5, 7));
  return `${MONTHS[month - 1] ?? ""} ${Number(date.slice(8, 10))}`;
}
