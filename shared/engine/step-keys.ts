import { isValidIsoDate, type IsoDate } from "./dates.ts";
import type { StepKind } from "./types.ts";

/*
 * Keys are how a tick-off survives a recompute. Daily steps carry their date
 * ("water:2026-09-10:1") so moving the visit yields new keys for new days;
 * one-off steps ("feed:starter") carry none so a done one-off is never
 * scheduled a second time after the visit moves.
 */
export function dailyKey(kind: StepKind, date: IsoDate, suffix?: string | number): string {
  return suffix === undefined ? `${kind}:${date}` : `${kind}:${date}:${suffix}`;
}

export function oneOffKey(kind: StepKind, name: string): string {
  return `${kind}:${name}`;
}

/** The date inside a daily key, or null for one-off keys. */
export function dateOfKey(key: string): IsoDate | null {
  const candidate = key.split(":")[1];
  return candidate !== undefined && isValidIsoDate(candidate) ? candidate : null;
}
