// Times a person reads are shown on the shop's wall clock, in the shop's locale, never in UTC.

export interface ShopClock {
  /** an IANA time zone, such as America/Halifax */
  timeZone: string;
  /** a BCP 47 language tag, such as en-CA */
  locale: string;
}

// Building an Intl.DateTimeFormat costs far more than formatting with one (a page of fifty times built
// a hundred of them), so each locale × time zone × style is built once per process. The kinds are few
// and fixed; the zones and locales are the shops' settings, so the memory stays small.
const formatters = new Map<string, Intl.DateTimeFormat>();
const MAX_FORMATTERS = 2_000;

type Style = "day" | "time" | "dayTime" | "record";

function formatter(clock: ShopClock, style: Style): Intl.DateTimeFormat {
  const key = `${clock.locale}\u0000${clock.timeZone}\u0000${style}`;
  let f = formatters.get(key);
  if (!f) {
    f = buildFormatter(clock, STYLES[style]);
    if (formatters.size >= MAX_FORMATTERS) formatters.clear();
    formatters.set(key, f);
  }
  return f;
}

const STYLES: Readonly<Record<Style, Intl.DateTimeFormatOptions>> = {
  day: { year: "numeric", month: "2-digit", day: "2-digit" },
  time: { hour: "numeric", minute: "2-digit" },
  dayTime: { month: "short", day: "numeric", hour: "numeric", minute: "2-digit" },
  record: { year: "numeric", month: "short", day: "numeric", hour: "numeric", minute: "2-digit" },
};

function buildFormatter(clock: ShopClock, options: Intl.DateTimeFormatOptions): Intl.DateTimeFormat {
  // A stored setting the runtime does not know falls back to plain English on UTC rather than failing a save.
  const locale = Intl.DateTimeFormat.supportedLocalesOf(clock.locale).length > 0 ? clock.locale : "en";
  try {
    return new Intl.DateTimeFormat(locale, { ...options, timeZone: clock.timeZone });
  } catch {
    return new Intl.DateTimeFormat(locale, { ...options, timeZone: "UTC", timeZoneName: "short" });
  }
}

/**
 * A moment as the shop's clock shows it: the time alone when it is the same day there as `now`,
 * otherwise the day and the time.
 */
export function formatShopTime(at: Date, clock: ShopClock, now: Date = new Date()): string {
  const day = formatter(clock, "day");
  const sameDay = day.format(at) === day.format(now);
  return formatter(clock, sameDay ? "time" : "dayTime").format(at);
}

/** A kept record's moment (a ledger line): always the day, month, year and time, on the shop's clock. */
export function formatShopRecordTime(at: Date, clock: ShopClock): string {
  return formatter(clock, "record").format(at);
}

/** Ends a sentence after a formatted time: "at 8:28 a.m." takes no second full stop. */
export function endSentence(text: string): string {
  return text.endsWith(".") ? text : `${text}.`;
}
