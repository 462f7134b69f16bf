import { describe, expect, it } from "vitest";
import { latestMonths } from "./report-months";

const row = (month: string, technicianId = "t1") => ({ month, technicianId });

describe("latestMonths", () => {
  it("keeps every row while the report holds no more months than asked", () => {
    const rows = [row("2026-01"), row("2026-01", "t2"), row("2026-02")];
    expect(latestMonths(rows, 2)).toEqual({ rows, monthCount: 2 });
    expect(latestMonths([], 12)).toEqual({ rows: [], monthCount: 0 });
  });

  it("keeps all rows of the latest months, across a year's end, and counts every month", () => {
    const rows = [
      row("2025-10"),
      row("2025-11"),
      row("2025-12", "t1"),
      row("2025-12", "t2"),
      row("2026-01"),
      row("2026-01", "t3"),
    ];
    expect(latestMonths(rows, 2)).toEqual({
      rows: [row("2025-12", "t1"), row("2025-12", "t2"), row("2026-01"), row("2026-01", "t3")],
      monthCount: 4,
    });
    expect(latestMonths(rows, 1).rows).toEqual([row("2026-01"), row("2026-01", "t3")]);
  });
});
