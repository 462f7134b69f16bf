import { describe, expect, it } from "vitest";
import { isOwnOrigin } from "./origin";

describe("isOwnOrigin: the request came from our own pages", () => {
  const app = "https://shop.chillwright.test";

  it("accepts exactly the configured origin", () => {
    expect(isOwnOrigin("https://shop.chillwright.test", app)).toBe(true);
    expect(isOwnOrigin("https://shop.chillwright.test:443", app)).toBe(true);
    expect(isOwnOrigin("http://127.0.0.1:3000", "http://127.0.0.1:3000")).toBe(true);
  });

  it.each([
    ["the wrong scheme", "http://shop.chillwright.test"],
    ["another port", "https://shop.chillwright.test:8443"],
    ["another host", "https://evil.example"],
    ["a look-alike subdomain", "https://shop.chillwright.test.evil.example"],
    ["a parent domain", "https://chillwright.test"],
    ["an opaque origin", "null"],
    ["no header", null],
    ["an empty header", ""],
    ["garbage", "not a url"],
    ["a path after the origin", "https://shop.chillwright.test/cases"],
    ["credentials", "https://user@shop.chillwright.test"],
  ])("refuses %s", (_label, origin) => {
    expect(isOwnOrigin(origin, app)).toBe(false);
  });

  it("compares with the app's origin, not with whatever host the request names", () => {
    // A request to our server with a spoofed Host / X-Forwarded-Host still carries the attacker's Origin.
    expect(isOwnOrigin("https://evil.example", "http://127.0.0.1:3000")).toBe(false);
    expect(isOwnOrigin("https://127.0.0.1:3000", "http://127.0.0.1:3000")).toBe(false);
  });
});
