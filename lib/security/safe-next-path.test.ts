import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { HOME_PATH, safeNextPath } from "./safe-next-path";

const ORIGIN = "https://app.chillwright.test";

// Each of these, followed by a browser as a Location header or router push, can leave the origin
// or run script: scheme-relative paths, backslashes browsers read as slashes, control characters
// browsers strip, encoded forms of all of those, absolute and pseudo-scheme URLs, dot segments.
const BYPASSES = [
  "//evil.example",
  "///evil.example",
  "/\\evil.example",
  "\\/evil.example",
  "\\\\evil.example",
  "/%5Cevil.example",
  "/%5cevil.example",
  "%5C%5Cevil.example",
  "/%09/evil.example",
  "/\t/evil.example",
  "/\n/evil.example",
  "/\r\n/evil.example",
  "/%0d%0a/evil.example",
  "/%0A/evil.example",
  "/%00/evil.example",
  "/\u0000/evil.example",
  "/\u0085/evil.example",
  "%2F%2Fevil.example",
  "/%2F/evil.example",
  "/%2f%2fevil.example",
  "https://evil.example",
  "http://evil.example/cases",
  "HTTPS://evil.example",
  "https:evil.example",
  "//user:pass@evil.example",
  "javascript:alert(1)",
  "JaVaScRiPt:alert(1)",
  " javascript:alert(1)",
  "data:text/html,<script>alert(1)</script>",
  "/..//evil.example",
  "/.%2e//evil.example",
  "/cases/..//evil.example",
  "/%2e%2e//evil.example",
  "/%E0%A4%A", // malformed percent-encoding
  "evil.example",
  "cases",
  "",
  "/sign-in",
  "/sign-in?next=//evil.example",
  `/${"a".repeat(3000)}`,
];

describe("safeNextPath: where to go after signing in", () => {
  it.each(BYPASSES)("sends %j home", (next) => {
    expect(safeNextPath(next, ORIGIN)).toBe(HOME_PATH);
  });

  it("sends anything that is not a string home", () => {
    for (const next of [undefined, null, 42, ["/cases"], { toString: () => "/cases" }])
      expect(safeNextPath(next, ORIGIN)).toBe(HOME_PATH);
  });

  it.each([
    ["/cases", "/cases"],
    ["/cases/42/interview", "/cases/42/interview"],
    ["/specs?q=corolla%202015", "/specs?q=corolla%202015"],
    ["/ledger#cylinders", "/ledger#cylinders"],
    ["/cases/42/../7", "/cases/7"],
    ["/settings/users?tab=people&x=1", "/settings/users?tab=people&x=1"],
  ])("follows the same-origin path %j as %j", (next, expected) => {
    expect(safeNextPath(next, ORIGIN)).toBe(expected);
  });

  it("never returns anything that leaves the origin, for any text (property)", () => {
    fc.assert(
      fc.property(
        fc.oneof(
          fc.string({ unit: "binary", maxLength: 40 }),
          fc
            .array(
              fc.constantFrom("/", "\\", "%2F", "%5C", "%09", "\t", "\n", ".", "%2e", "evil", ":", "@"),
              {
                maxLength: 8,
              },
            )
            .map((parts) => parts.join("")),
        ),
        (next) => {
          const target = safeNextPath(next, ORIGIN);
          expect(target.startsWith("/")).toBe(true);
          expect(target.startsWith("//")).toBe(false);
          expect(target).not.toMatch(/[\\\u0000-\u001f\u007f]/);
          expect(new URL(target, ORIGIN).origin).toBe(ORIGIN);
        },
      ),
      { numRuns: 2000 },
    );
  });
});
