import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { hermite, monotoneSlopes } from "./monotone-hermite";
import { propertyRuns } from "@/tests/support/property-runs";

function interpolate(xs: number[], ys: number[], slopes: Float64Array, x: number): number {
  let i = 0;
  while (i < xs.length - 2 && x > xs[i + 1]!) i++;
  return hermite(x, xs[i]!, xs[i + 1]! - xs[i]!, ys[i]!, ys[i + 1]!, slopes[i]!, slopes[i + 1]!);
}

describe("monotone cubic Hermite (Fritsch & Carlson 1980)", () => {
  it("reproduces a cubic's nodes and stays close between them", () => {
    const xs = Array.from({ length: 41 }, (_, i) => i * 0.05);
    const f = (x: number) => 1 + 2 * x + 0.3 * x * x + 0.1 * x * x * x;
    const ys = xs.map(f);
    const slopes = monotoneSlopes(xs, ys);
    for (let x = 0; x <= 2; x += 0.0137)
      expect(Math.abs(interpolate(xs, ys, slopes, x) - f(x))).toBeLessThan(1e-5);
    xs.forEach((x, i) => expect(interpolate(xs, ys, slopes, x)).toBeCloseTo(ys[i]!, 12));
  });

  it("never overshoots monotone data, even with flat steps (the Fritsch–Carlson guarantee)", () => {
    const data = fc
      .array(
        fc.tuple(
          fc.double({ min: 0.01, max: 10, noNaN: true }),
          fc.oneof(fc.constant(0), fc.double({ min: 0, max: 100, noNaN: true })),
        ),
        { minLength: 3, maxLength: 30 },
      )
      .map((steps) => {
        const xs = [0];
        const ys = [0];
        for (const [dx, dy] of steps) {
          xs.push(xs.at(-1)! + dx);
          ys.push(ys.at(-1)! + dy);
        }
        return { xs, ys };
      });
    fc.assert(
      fc.property(data, fc.double({ min: 0, max: 1, noNaN: true }), ({ xs, ys }, where) => {
        const slopes = monotoneSlopes(xs, ys);
        const i = Math.min(xs.length - 2, Math.floor(where * (xs.length - 1)));
        const x = xs[i]! + (where * (xs.length - 1) - i) * (xs[i + 1]! - xs[i]!);
        const y = hermite(
          Math.min(x, xs[i + 1]!),
          xs[i]!,
          xs[i + 1]! - xs[i]!,
          ys[i]!,
          ys[i + 1]!,
          slopes[i]!,
          slopes[i + 1]!,
        );
        const scale = Math.max(1, Math.abs(ys[i + 1]!));
        expect(y).toBeGreaterThanOrEqual(ys[i]! - 1e-9 * scale);
        expect(y).toBeLessThanOrEqual(ys[i + 1]! + 1e-9 * scale);
      }),
      { numRuns: propertyRuns(1000) },
    );
  });

  it("works on a falling x axis (1/T falls as T rises)", () => {
    const xs = [5, 4, 3, 2, 1];
    const ys = xs.map((x) => -x);
    const slopes = monotoneSlopes(xs, ys);
    expect(hermite(4.5, 5, -1, ys[0]!, ys[1]!, slopes[0]!, slopes[1]!)).toBeCloseTo(-4.5, 12);
    expect(hermite(1.25, 2, -1, ys[3]!, ys[4]!, slopes[3]!, slopes[4]!)).toBeCloseTo(-1.25, 12);
  });

  it("rejects too few points", () => {
    expect(() => monotoneSlopes([0, 1], [0, 1])).toThrow(RangeError);
  });
});
