/** "+13305550111" → "(330) 555-0111"; other numbers are shown as stored. */
export function displayPhone(e164: string): string {
  const us = /^\+1(\d{3})(\d{3})(\d{4})$/.exec(e164);
  return us ? `(${us[1]}) ${us[2]}-${us[3]}` : e164;
}

/** "09:00" → "9:00 am", the way people in the US read a clock. */
export function displayTime(hhmm: string): string {
  const [h, m] = hhmm.split(":").map(Number) as [number, number];
  const suffix = h < 12 ? "am" : "pm";
  const hour = h % 12 === 0 ? 12 : h % 12;
  return `${hour}:${String(m).padStart(2, "0")} ${suffix}`;
}

export function arrivalWindow(start: string | null, end: string | null): string | null {
  if (start && end) return `${displayTime(start)}–${displayTime(end)}`;
  if (start) return `from ${displayTime(start)}`;
  if (end) return `by ${displayTime(end)}`;
  return null;
}
