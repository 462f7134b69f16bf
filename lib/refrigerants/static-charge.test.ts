import { describe, expect, it } from "vitest";
import type { DiagnosisInput } from "@/lib/diagnosis";
import { EMPTY_STATIC_MAX_KPA_GAUGE, staticPressureLeft, staticShowsNoCharge } from "./static-charge";

// R-134a saturation at 25 °C: 665.4 kPa absolute (Tillner-Roth & Baehr 1994); sea level 101.325 kPa (ISO 2533).
const FULL_R134A_25C_KPA_GAUGE = 665.4 - 101.325;

describe("staticShowsNoCharge", () => {
  it("reads the findings engine's own input, so the engine can call it with what it has", () => {
    const input: DiagnosisInput = {
      refrigerant: "R-134a",
      expansionDevice: "orifice_tube",
      ambientC: 25,
      staticKpaGauge: FULL_R134A_25C_KPA_GAUGE,
    };
    expect(staticShowsNoCharge(input)).toBe(false);
    expect(staticShowsNoCharge({ ...input, staticKpaGauge: FULL_R134A_25C_KPA_GAUGE / 3 })).toBe(true);
  });

  it("is true at about 0 kPa gauge even with no ambient (common practice: gauge resolution), false above it", () => {
    expect(staticShowsNoCharge({ refrigerant: "R-134a", staticKpaGauge: EMPTY_STATIC_MAX_KPA_GAUGE })).toBe(
      true,
    );
    expect(staticShowsNoCharge({ refrigerant: "R-134a", staticKpaGauge: 100 })).toBe(false);
  });

  it("cannot call an R-744 system empty above its critical temperature (30.98 °C, Span & Wagner 1996)", () => {
    expect(staticShowsNoCharge({ refrigerant: "R-744", staticKpaGauge: 3000, ambientC: 38 })).toBe(false);
  });
});

describe("staticPressureLeft", () => {
  it("is true above about 0 kPa gauge and false at or below it", () => {
    expect(staticPressureLeft({ staticKpaGauge: EMPTY_STATIC_MAX_KPA_GAUGE + 1 })).toBe(true);
    expect(staticPressureLeft({ staticKpaGauge: EMPTY_STATIC_MAX_KPA_GAUGE })).toBe(false);
  });
});
