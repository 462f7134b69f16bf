import { describe, expect, it } from "vitest";
import { inputLimitMessage } from "./input-limits";

// Each kind of limit says why a figure past it is refused: a mass or a time cannot be negative, a gauge
// pressure cannot be below a perfect vacuum, a temperature or a percentage below its range is implausible.
describe("inputLimitMessage: one wording per kind of limit", () => {
  it("says a mass or a soak time cannot be negative", () => {
    expect(inputLimitMessage("labelChargeG", "min")).toBe("label charge cannot be negative");
    expect(inputLimitMessage("staticSoakMin", "min")).toBe("soak time cannot be negative");
  });

  it("says a gauge pressure cannot be below a perfect vacuum", () => {
    expect(inputLimitMessage("lowKpaGauge", "min")).toMatch(
      /^low-side pressure cannot be below a perfect vacuum \(/,
    );
  });

  it("says a temperature or a purity below its range is not plausible, whatever its lower end", () => {
    expect(inputLimitMessage("ventC", "min")).toBe("vent temperature below −30 °C is not plausible");
    expect(inputLimitMessage("identifierPurityPct", "min")).toBe("purity below 0 % is not plausible");
    expect(inputLimitMessage("ventC", "max")).toBe("vent temperature above 60 °C is not plausible");
  });
});
