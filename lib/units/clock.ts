// Times a person reads are shown on the shop's wall clock, in the shop's locale, never in UTC.

export interface ShopClock {
  /** an IANA time zone, such as America/Halifax */
  timeZone: string;
  /** a BCP 47 language tag, such as en-CA */
  locale: string;
}

function formatter(clock: ShopClock, options: Intl.DateTimeFormatOptions): Intl.DateTimeFormat {
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
  const day = formatter(clock, { year: "numeric", month: "2-digit", day: "2-digit" });
  const sameDay = day.format(at) === day.format(now);
  return formatter(
    clock,
    sameDay
      ? { hour: "numeric", minute: "2-digit" }
      : { month: "short", day: "numeric", hour: "numeric", minute: "2-digit" },
  ).format(at);
}

/** Ends a sentence after a formatted time: "at 8:28 a.m." takes no second full stop. */
export function endSentence(text: string): string {
  return text.endsWith(".") ? text : `${text}.`;
}
