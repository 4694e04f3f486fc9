/** Dates and greetings in the studio's time zone, not the device's. */

export function formatStudioDate(date: Date, timeZone: string): string {
  return new Intl.DateTimeFormat('en-GB', {
    weekday: 'long',
    day: 'numeric',
    month: 'long',
    year: 'numeric',
    timeZone,
  }).format(date);
}

/** The hour (0–23) on the studio's clock. */
export function studioHour(date: Date, timeZone: string): number {
  const hour = new Intl.DateTimeFormat('en-GB', { hour: 'numeric', hourCycle: 'h23', timeZone })
    .formatToParts(date)
    .find((part) => part.type === 'hour');
  return Number(hour?.value ?? 0);
}

/** Morning from 5:00, afternoon from 12:00, evening from 18:00 until 5:00 (kitchens work late). */
export function greeting(date: Date, timeZone: string): string {
  const hour = studioHour(date, timeZone);
  if (hour >= 5 && hour < 12) return 'Good morning';
  if (hour >= 12 && hour < 18) return 'Good afternoon';
  return 'Good evening';
}

/** The device's own zone, used only when the studio's is unknown. */
export function deviceTimeZone(): string {
  return Intl.DateTimeFormat().resolvedOptions().timeZone;
}
