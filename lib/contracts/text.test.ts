import { describe, expect, it } from "vitest";
import {
  isPlausibleInstant,
  multiLineText,
  plausibleInstant,
  singleLineText,
  TEXT_MESSAGES,
  textProblem,
} from "./text";

const LONE_HIGH = "\uD83D";
const LONE_LOW = "\uDE00";

describe("textProblem", () => {
  it("accepts accented, CJK, emoji and astral text on one line", () => {
    for (const text of ["Škoda Octavia", "冷却 ✓ 𝄞", "R-1234yf 😀 −29 °C", "שלום", "مرحبا"]) {
      expect(textProblem(text, "single")).toBeNull();
      expect(textProblem(text, "multi")).toBeNull();
    }
  });

  it("refuses a lone surrogate of either half, alone or beside a whole pair", () => {
    for (const text of [LONE_HIGH, LONE_LOW, `a${LONE_HIGH}b`, `😀${LONE_LOW}`, `${LONE_LOW}${LONE_HIGH}`]) {
      expect(textProblem(text, "single")).toBe(TEXT_MESSAGES.illFormed);
      expect(textProblem(text, "multi")).toBe(TEXT_MESSAGES.illFormed);
    }
  });

  it("refuses NUL, other C0/C1 controls and DEL everywhere", () => {
    for (const text of ["a\u0000b", "\u0007", "x\u001B[31m", "\u007F", "\u0085", "\u009F"]) {
      expect(textProblem(text, "multi")).toBe(TEXT_MESSAGES.control);
      expect(textProblem(text, "single")).not.toBeNull();
    }
  });

  it("refuses bidi overrides, embeddings and isolates", () => {
    for (const cp of [0x202a, 0x202b, 0x202c, 0x202d, 0x202e, 0x2066, 0x2067, 0x2068, 0x2069]) {
      const text = `invoice${String.fromCodePoint(cp)}fdp.exe`;
      expect(textProblem(text, "single")).toBe(TEXT_MESSAGES.bidi);
      expect(textProblem(text, "multi")).toBe(TEXT_MESSAGES.bidi);
    }
  });

  it("lets multi-line text hold tabs and line breaks, single-line text none", () => {
    for (const text of ["one\ntwo", "one\r\ntwo", "a\tb", "a\u2028b"]) {
      expect(textProblem(text, "single")).toBe(TEXT_MESSAGES.singleLine);
    }
    for (const text of ["one\ntwo", "one\r\ntwo", "a\tb"]) expect(textProblem(text, "multi")).toBeNull();
  });
});

describe("the zod helpers", () => {
  it("keep chaining trim, min and max after the check, with every message", () => {
    const name = singleLineText().trim().min(1, "Enter a name.").max(5);
    expect(name.parse("  abc ")).toBe("abc");
    const result = name.safeParse("\u0000");
    expect(result.success).toBe(false);
    expect(result.error?.issues.map((i) => i.message)).toContain(TEXT_MESSAGES.control);
    expect(multiLineText().safeParse("line 1\nline 2").success).toBe(true);
  });
});

describe("plausibleInstant", () => {
  const now = Date.parse("2026-06-01T12:00:00Z");
  it("accepts the past since 1990 and up to a day ahead", () => {
    expect(isPlausibleInstant("1990-01-01T00:00:00Z", now)).toBe(true);
    expect(isPlausibleInstant("2026-06-02T11:59:00Z", now)).toBe(true);
  });
  it("refuses year 0, year 9999 and anything before 1990 or over a day ahead", () => {
    for (const iso of [
      "0000-01-01T00:00:00Z",
      "9999-12-31T23:59:59Z",
      "1989-12-31T23:59:59Z",
      "2026-06-02T12:01:00Z",
    ]) {
      expect(isPlausibleInstant(iso, now)).toBe(false);
    }
  });
  it("answers with a message that names the year", () => {
    const result = plausibleInstant().safeParse("0000-01-01T00:00:00Z");
    expect(result.success).toBe(false);
    expect(result.error?.issues[0]?.message).toMatch(/1990.*year/);
    expect(plausibleInstant().safeParse("2020-02-29T10:00:00+02:00").success).toBe(true);
  });
});
