import { describe, expect, it } from "vitest";
import { isTryAgainStatus, nextRetryDelayMs, retryAfterMs } from "./retry-after";

describe("retryAfterMs", () => {
  const now = Date.parse("2026-12-02T12:00:00Z");

  it("reads delay-seconds", () => {
    expect(retryAfterMs("5", now)).toBe(5000);
    expect(retryAfterMs(" 0 ", now)).toBe(0);
  });

  it("reads an HTTP date relative to now, a past date as no wait", () => {
    expect(retryAfterMs("Wed, 02 Dec 2026 12:00:07 GMT", now)).toBe(7000);
    expect(retryAfterMs("Wed, 02 Dec 2026 11:59:00 GMT", now)).toBe(0);
  });

  it("ignores what it cannot read", () => {
    expect(retryAfterMs(null, now)).toBeUndefined();
    expect(retryAfterMs(undefined, now)).toBeUndefined();
    expect(retryAfterMs("", now)).toBeUndefined();
    expect(retryAfterMs("-3", now)).toBeUndefined();
    expect(retryAfterMs("1.5", now)).toBeUndefined();
    expect(retryAfterMs("soon", now)).toBeUndefined();
  });
});

describe("nextRetryDelayMs", () => {
  it("keeps our backoff when the server asks for less or nothing", () => {
    expect(nextRetryDelayMs(4000, undefined, 15_000)).toBe(4000);
    expect(nextRetryDelayMs(4000, 1000, 15_000)).toBe(4000);
  });

  it("waits as long as the server asked, up to the ceiling", () => {
    expect(nextRetryDelayMs(1000, 5000, 15_000)).toBe(5000);
    expect(nextRetryDelayMs(1000, 120_000, 15_000)).toBe(15_000);
  });
});

describe("isTryAgainStatus", () => {
  it("is true for busy and too-many answers only", () => {
    expect(isTryAgainStatus(503)).toBe(true);
    expect(isTryAgainStatus(429)).toBe(true);
    for (const status of [400, 401, 403, 404, 409, 422, 500, 502])
      expect(isTryAgainStatus(status)).toBe(false);
  });
});
