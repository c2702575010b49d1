// A 24-hour clock: on a shop floor "07:00" cannot be mistaken for the evening.
const timeFormats = new Map<string, Intl.DateTimeFormat>();
const dateFormats = new Map<string, Intl.DateTimeFormat>();

function cached(cache: Map<string, Intl.DateTimeFormat>, timeZone: string, options: Intl.DateTimeFormatOptions) {
  let format = cache.get(timeZone);
  if (!format) {
    format = new Intl.DateTimeFormat('en', { ...options, timeZone });
    cache.set(timeZone, format);
  }
  return format;
}

/** The wall-clock time in the shop's zone, whatever zone the board's own computer is set to. */
export function formatShopTime(instant: Date, timeZone: string): string {
  return cached(timeFormats, timeZone, { hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }).format(instant);
}

export function formatShopDate(instant: Date, timeZone: string): string {
  return cached(dateFormats, timeZone, { weekday: 'long', day: 'numeric', month: 'long' }).format(instant);
}
