import { describe, expect, it } from "vitest";
import { casebookFiltersSchema } from "./casebook";

function dateError(from: string, to?: string) {
  const result = casebookFiltersSchema.safeParse({ from, to });
  return result.success ? null : result.error.issues.map((i) => i.message).join(" | ");
}

describe("casebook date filters", () => {
  it("takes real days in a plausible range, including a day ahead of today", () => {
    expect(dateError("2024-02-29", "2026-12-31")).toBeNull();
    expect(dateError("1990-01-01")).toBeNull();
    expect(dateError("2100-12-31")).toBeNull();
  });

  it("refuses days the calendar does not have", () => {
    expect(dateError("2026-02-31")).toMatch(/not a real date/);
    expect(dateError("2025-02-29")).toMatch(/not a real date/);
    expect(dateError("2026-13-01")).toMatch(/not a real date/);
  });

  it("refuses years that are typing slips, saying which", () => {
    expect(dateError("0000-01-01")).toMatch(/between 1990 and 2100/);
    expect(dateError("1989-12-31")).toMatch(/between 1990 and 2100/);
    expect(dateError("9999-01-01")).toMatch(/between 1990 and 2100/);
  });

  it("still reads an empty field as no filter", () => {
    const result = casebookFiltersSchema.parse({ from: "", to: "" });
    expect(result.from).toBeUndefined();
    expect(result.to).toBeUndefined();
  });
});
