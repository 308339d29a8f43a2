import { localMinutesAt } from "#shared/engine/zone-time";

const MS_PER_MINUTE = 60_000;
const MS_PER_DAY = 86_400_000;

/** UTC offset of `zone` (minutes, local minus UTC) at an instant. */
export function offsetMinutesAt(zone: string, epochMs: number): number {
  const minute = Math.floor(epochMs / MS_PER_MINUTE);
  return localMinutesAt(zone, minute * MS_PER_MINUTE) - minute;
}

/** The instant of a wall-clock time given as UTC fields (two passes settle the offset near a change). */
export function instantOfWallClock(zone: string, wallAsUtcMs: number): number {
  let instant = wallAsUtcMs;
  for (let pass = 0; pass < 2; pass += 1) instant = wallAsUtcMs - offsetMinutesAt(zone, instant) * MS_PER_MINUTE;
  return instant;
}

export type OffsetChange = { atMs: number; fromMinutes: number; toMinutes: number };

/**
 * Every offset change of `zone` between two instants, found by sampling daily and bisecting
 * to the minute (no zone changes its offset twice within a day).
 */
export function offsetChanges(zone: string, fromMs: number, toMs: number): OffsetChange[] {
  const changes: OffsetChange[] = [];
  let before = offsetMinutesAt(zone, fromMs);
  for (let t = fromMs; t < toMs; t += MS_PER_DAY) {
    const next = Math.min(t + MS_PER_DAY, toMs);
    const after = offsetMinutesAt(zone, next);
    if (after === before) continue;
    let lo = t;
    let hi = next;
    while (hi - lo > MS_PER_MINUTE) {
      const mid = lo + Math.floor((hi - lo) / 2 / MS_PER_MINUTE) * MS_PER_MINUTE;
      if (offsetMinutesAt(zone, mid) === before) lo = mid;
      else hi = mid;
    }
    changes.push({ atMs: hi, fromMinutes: before, toMinutes: after });
    before = after;
  }
  return changes;
}
