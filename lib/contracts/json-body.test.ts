import { describe, expect, it } from "vitest";
import { boundedJson, illFormedTextPath, jsonDepth, valueDepth } from "./json-body";

const nested = (levels: number) => "[".repeat(levels) + "]".repeat(levels);

describe("jsonDepth", () => {
  it("counts objects and arrays, not brackets inside strings or after escapes", () => {
    expect(jsonDepth("1")).toBe(0);
    expect(jsonDepth('{"a":[1,{"b":2}]}')).toBe(3);
    expect(jsonDepth('{"a":"[[[[{{{{"}')).toBe(1);
    expect(jsonDepth('{"a":"\\"[[[["}')).toBe(1);
    expect(jsonDepth('["\\\\",[[]]]')).toBe(3);
  });
  it("stops counting past the limit, so a 100,000-level body costs one pass at most", () => {
    expect(jsonDepth(nested(100_000), 16)).toBe(17);
    expect(jsonDepth(nested(100_000))).toBe(100_000);
  });
});

describe("valueDepth", () => {
  it("agrees with jsonDepth on parsed values, deep ones included, without recursion", () => {
    for (const text of ["1", "[]", '{"a":[1,{"b":2}]}', nested(50_000)]) {
      expect(valueDepth(JSON.parse(text))).toBe(jsonDepth(text));
    }
  });
});

describe("illFormedTextPath", () => {
  it("finds a lone surrogate in a value or a key and names where", () => {
    expect(illFormedTextPath({ a: ["ok", "😀"] })).toBeNull();
    expect(illFormedTextPath(JSON.parse('{"answers":{"complaint":{"notes":"x\\ud800"}}}'))).toBe(
      "answers.complaint.notes",
    );
    expect(illFormedTextPath(JSON.parse('{"list":["a","\\udc00"]}'))).toBe("list.1");
    expect(illFormedTextPath(JSON.parse('{"drafts":{"\\ud800":1}}'))).toBe("drafts");
    expect(illFormedTextPath("\ud800")).toBe("_");
  });
});

describe("boundedJson", () => {
  const draft = boundedJson({ maxDepth: 3, maxChars: 50 });
  it("keeps a shallow small value as it is", () => {
    expect(draft.parse({ a: [1, "x"] })).toEqual({ a: [1, "x"] });
  });
  it("refuses values too deep or too large", () => {
    expect(draft.safeParse(JSON.parse(nested(4))).success).toBe(false);
    expect(draft.safeParse({ a: "x".repeat(60) }).success).toBe(false);
  });
});
