import { describe, expect, it } from "vitest";
import { secureCookies } from "./cookies";

describe("secureCookies", () => {
  it("leaves Secure off only for plain HTTP on this machine", () => {
    expect(secureCookies("http://127.0.0.1:3000")).toBe(false);
    expect(secureCookies("http://localhost:3100")).toBe(false);
    expect(secureCookies("http://[::1]:3000")).toBe(false);
  });

  it("sets Secure for HTTPS and for any other host", () => {
    expect(secureCookies("https://127.0.0.1:3000")).toBe(true);
    expect(secureCookies("https://shop.chillwright.test")).toBe(true);
    expect(secureCookies("http://shop.chillwright.test")).toBe(true);
    expect(secureCookies("http://workshop.test:3000")).toBe(true);
  });
});
