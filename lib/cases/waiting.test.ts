import { describe, expect, it } from "vitest";
import { queueSentence, waitedFor } from "./waiting";

const NOW = Date.UTC(2026, 11, 3, 15, 0, 0);
const ago = (ms: number) => NOW - ms;
const MIN = 60_000;

describe("waitedFor", () => {
  it("says minutes, hours and minutes, then days", () => {
    expect(waitedFor(ago(20_000), NOW)).toBe("under a minute");
    expect(waitedFor(ago(59 * MIN + 59_000), NOW)).toBe("59 min");
    expect(waitedFor(ago(60 * MIN), NOW)).toBe("1 h");
    expect(waitedFor(ago(135 * MIN), NOW)).toBe("2 h 15 min");
    expect(waitedFor(ago(24 * 60 * MIN - 1), NOW)).toBe("23 h 59 min");
    expect(waitedFor(ago(24 * 60 * MIN), NOW)).toBe("1 day");
    expect(waitedFor(ago(3 * 24 * 60 * MIN + 5 * 60 * MIN), NOW)).toBe("3 days");
  });

  it("reads a submission stamped a little in the future as just now", () => {
    expect(waitedFor(NOW + 90_000, NOW)).toBe("under a minute");
  });
});

describe("queueSentence", () => {
  it("says how many wait and how long the oldest has", () => {
    expect(queueSentence(0, null, NOW)).toBe("Nothing is waiting for sign-off.");
    expect(queueSentence(1, ago(42 * MIN), NOW)).toBe("1 case waits, for 42 min.");
    expect(queueSentence(3, ago(26 * 60 * MIN), NOW)).toBe("3 cases wait; the oldest for 1 day.");
  });
});
