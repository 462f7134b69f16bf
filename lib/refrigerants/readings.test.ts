import { describe, expect, it } from "vitest";
import { runningPhysics } from "./readings";

// R-134a saturation: 1317.905 kPa abs at 50 °C and 292.803 kPa abs at 0 °C (Tillner-Roth & Baehr 1994);
// a standard atmosphere is 101.325 kPa at sea level and 84.556 kPa at 1500 m (US Standard Atmosphere 1976).
const AT_50C_KPA_GAUGE = 1317.905 - 101.325;
const AT_0C_KPA_GAUGE = 292.803 - 101.325;

describe("runningPhysics", () => {
  it("gives condensing and evaporating temperatures, approach, lift, subcooling and superheat (Tillner-Roth & Baehr 1994)", () => {
    const p = runningPhysics({
      refrigerant: "R-134a",
      ambientC: 35,
      highKpaGauge: AT_50C_KPA_GAUGE,
      lowKpaGauge: AT_0C_KPA_GAUGE,
      liquidLineC: 45,
      suctionLineC: 8,
    });
    expect(p.barometricKpa).toBeCloseTo(101.325, 3);
    expect(p.condensingC).toBeCloseTo(50, 2);
    expect(p.evaporatingC).toBeCloseTo(0, 2);
    expect(p.condensingApproachK).toBeCloseTo(15, 2);
    expect(p.liftK).toBeCloseTo(50, 2);
    expect(p.subcoolingK).toBeCloseTo(5, 2);
    expect(p.superheatK).toBeCloseTo(8, 2);
  });

  it("reads the gauges against the atmosphere at the altitude (US Standard Atmosphere 1976)", () => {
    const p = runningPhysics({
      refrigerant: "R-134a",
      altitudeM: 1500,
      highKpaGauge: 1317.905 - 84.556,
    });
    expect(p.barometricKpa).toBeCloseTo(84.556, 2);
    expect(p.condensingC).toBeCloseTo(50, 1);
  });

  it("leaves out what a missing reading would need, and what lies off the table", () => {
    const p = runningPhysics({ refrigerant: "R-134a", highKpaGauge: AT_50C_KPA_GAUGE, liquidLineC: 45 });
    expect(p.subcoolingK).toBeCloseTo(5, 2);
    expect(p).not.toHaveProperty("condensingApproachK");
    expect(p).not.toHaveProperty("evaporatingC");
    expect(p).not.toHaveProperty("superheatK");
    expect(p).not.toHaveProperty("liftK");
    // −95 kPa gauge at sea level is 6.3 kPa abs: below the R-134a table, which starts at −40 °C (51.2 kPa abs).
    const vacuum = runningPhysics({ refrigerant: "R-134a", lowKpaGauge: -95, suctionLineC: 10 });
    expect(vacuum.lowKpaAbs).toBeCloseTo(6.325, 3);
    expect(vacuum).not.toHaveProperty("evaporatingC");
    expect(vacuum).not.toHaveProperty("superheatK");
  });

  it("marks an R-744 high side above the critical pressure transcritical: no condensing temperature (Span & Wagner 1996, pc 7.3773 MPa)", () => {
    const p = runningPhysics({ refrigerant: "R-744", ambientC: 35, highKpaGauge: 9000, liquidLineC: 40 });
    expect(p.highSideTranscritical).toBe(true);
    expect(p).not.toHaveProperty("condensingC");
    expect(p).not.toHaveProperty("subcoolingK");
  });
});
