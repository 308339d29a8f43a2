import { followUpReasonLabels, type FollowUpReason } from "#shared/schemas/follow-ups";

const oneDecimal = new Intl.NumberFormat(undefined, { maximumFractionDigits: 1, minimumFractionDigits: 1 });
const whole = new Intl.NumberFormat(undefined, { maximumFractionDigits: 0 });
const money = new Intl.NumberFormat(undefined, { style: "currency", currency: "USD", maximumFractionDigits: 0 });

/** A rate per 100 seeding visits; "—" when there were no seeding visits to divide by. */
export const formatRate = (rate: number | null) => (rate === null ? "—" : oneDecimal.format(rate));
export const formatMoney = (value: number) => money.format(value);
export const formatCount = (value: number) => whole.format(value);
export const formatPercent = (value: number | null) => (value === null ? "—" : `${whole.format(value)}%`);

export function formatHours(hours: number | null): string {
  if (hours === null) return "—";
  if (hours === 0) return "0 h";
  if (hours < 1) return `${whole.format(hours * 60)} min`;
  if (hours < 48) return `${oneDecimal.format(hours)} h`;
  return `${oneDecimal.format(hours / 24)} days`;
}

const monthFormat = new Intl.DateTimeFormat("en-US", { month: "short", year: "numeric", timeZone: "UTC" });
/** "2026-09" → "Sept 2026". */
export const formatMonth = (month: string) => monthFormat.format(new Date(`${month}-01T00:00:00Z`));

const dayFormat = new Intl.DateTimeFormat("en-US", { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" });
export const formatDay = (iso: string) => dayFormat.format(new Date(`${iso}T00:00:00Z`));

export const reasonLabel = (reason: FollowUpReason) => followUpReasonLabels[reason];


/** Our palette for charts: rates in pine, costs in loam, the worst bar in rust. */
export const chartColours = { rate: "#1f5a36", cost: "#7a4a24", highlight: "#9b2c1c", muted: "#6b4e00", grid: "#d7d1bf", ink: "#1b2a1f" } as const;
