// The one date and time formatter of the product: every date and time a page, a list or a printout shows
// is written here, in the shop's time zone, with the zone named, in one format ("2 Dec 2026, 09:00 UTC").
// Pure: the zone is given (the server's, see db/settings.ts `shopTimeZone`), never the viewer's browser's,
// so the same instant reads the same on every page and every screen.

const MONTHS = ["Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct", "Nov", "Dec"] as const;

/** An instant as the API gives it (ISO 8601 text), as milliseconds, or as a Date. */
export type Instant = string | number | Date;

const formatters = new Map<string, Intl.DateTimeFormat>();
function formatter(zone: string): Intl.DateTimeFormat {
  let f = formatters.get(zone);
  if (!f) {
    f = new Intl.DateTimeFormat("en-US", { timeZone: zone, year: "numeric", month: "numeric", day: "numeric", hour: "numeric", minute: "numeric", hourCycle: "h23" });
    formatters.set(zone, f);
  }
  return f;
}

/** Whether a text names a time zone this runtime knows (an IANA name such as "Europe/Berlin", or "UTC"). */
export function isTimeZone(zone: string): boolean {
  try {
    formatter(zone);
    return true;
  } catch (error) {
    // Intl refuses an unknown zone with a RangeError: that is the answer "no"; anything else is a defect.
    if (error instanceof RangeError) return false;
    throw error;
  }
}

function parts(at: Instant, zone: string) {
  const date = at instanceof Date ? at : new Date(at);
  if (Number.isNaN(date.getTime())) return null;
  const p = Object.fromEntries(formatter(zone).formatToParts(date).map((x) => [x.type, x.value]));
  return { day: Number(p.day), month: MONTHS[Number(p.month) - 1], year: p.year, time: `${p.hour.padStart(2, "0")}:${p.minute}` };
}

/** A date: "2 Dec 2026". */
export function dateText(at: Instant, zone: string): string {
  const p = parts(at, zone);
  return p ? `${p.day} ${p.month} ${p.year}` : "—";
}

/** A date and time with the zone named: "2 Dec 2026, 09:00 UTC". */
export function dateTimeText(at: Instant, zone: string): string {
  const p = parts(at, zone);
  return p ? `${p.day} ${p.month} ${p.year}, ${p.time} ${zone}` : "—";
}

/** A time of day with the zone named: "09:00 UTC". */
export function timeText(at: Instant, zone: string): string {
  const p = parts(at, zone);
  return p ? `${p.time} ${zone}` : "—";
}
