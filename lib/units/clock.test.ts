import { describe, expect, it } from "vitest";
import { endSentence, formatShopRecordTime, formatShopTime } from "./clock";

// Time zone rules from the IANA time zone database; wall-clock offsets for these dates: Halifax
// UTC−4 (daylight time until 1 Nov 2026), Denver UTC−7 (standard time from 1 Nov 2026).

describe("formatShopTime", () => {
  const at = new Date("2026-12-03T14:05:00Z");

  it("shows the shop's wall clock, not UTC", () => {
    const halifax = formatShopTime(at, { timeZone: "America/Halifax", locale: "en-GB" }, at);
    expect(halifax).toBe("10:05"); // UTC−4 in December
    const denver = formatShopTime(at, { timeZone: "America/Denver", locale: "en-US" }, at);
    expect(denver).toBe("7:05 AM"); // UTC−7 in December, 12-hour clock in en-US
  });

  it("adds the day when the change was not today on the shop's clock", () => {
    const nextMorning = new Date("2026-12-04T15:00:00Z");
    expect(formatShopTime(at, { timeZone: "America/Halifax", locale: "en-GB" }, nextMorning)).toBe(
      "3 Dec, 10:05",
    );
  });

  it("judges 'today' on the shop's clock: 02:00 UTC is still the day before in Denver", () => {
    const late = new Date("2026-12-04T02:00:00Z"); // 19:00 on 3 Dec in Denver
    const now = new Date("2026-12-04T03:00:00Z"); // 20:00 on 3 Dec in Denver
    expect(formatShopTime(late, { timeZone: "America/Denver", locale: "en-GB" }, now)).toBe("19:00");
  });

  it("falls back to UTC, and says so, for a time zone the runtime does not know", () => {
    expect(formatShopTime(at, { timeZone: "Mars/Olympus", locale: "en-GB" }, at)).toBe("14:05 UTC");
  });
});

describe("formatShopRecordTime", () => {
  const at = new Date("2026-12-03T14:05:00Z");

  it("always says the day and the year of a kept record, in the shop's own locale and clock", () => {
    const halifaxCa = formatShopRecordTime(at, { timeZone: "America/Halifax", locale: "en-CA" });
    expect(halifaxCa).toMatch(/^Dec 3, 2026, 10:05\sa\.m\.$/);
    const halifaxGb = formatShopRecordTime(at, { timeZone: "America/Halifax", locale: "en-GB" });
    expect(halifaxGb).toBe("3 Dec 2026, 10:05");
    const denver = formatShopRecordTime(at, { timeZone: "America/Denver", locale: "en-US" });
    expect(denver).toMatch(/^Dec 3, 2026, 7:05\sAM$/);
  });
});

describe("endSentence", () => {
  it("adds a full stop unless the formatted time already ends with one", () => {
    expect(endSentence("10:05")).toBe("10:05.");
    expect(endSentence("8:28 a.m.")).toBe("8:28 a.m.");
  });
});
