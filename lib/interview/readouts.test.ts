import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { diagnose } from "@/lib/diagnosis";
import { SUBCOOLING_K } from "@/lib/diagnosis/grading";
import { SERVICE_REFRIGERANT_IDS } from "@/lib/refrigerants/catalog";
import { runningPhysics } from "@/lib/refrigerants/readings";
import { sayInUnits, unitsOfSystem } from "@/lib/units";
import { liveReadouts as markedReadouts } from "./readouts";

/** The lines as an SI reader sees them. */
function liveReadouts(...args: Parameters<typeof markedReadouts>) {
  const lines = markedReadouts(...args);
  return Object.fromEntries(
    Object.entries(lines).map(([field, list]) => [
      field,
      list.map((l) => ({ ...l, text: sayInUnits(l.text) })),
    ]),
  );
}
import { propertyRuns } from "@/tests/support/property-runs";

// R-134a saturation: 1317.905 kPa abs at 50 °C, 292.803 kPa abs at 0 °C, 665.381 kPa abs at 25 °C
// (Tillner-Roth & Baehr 1994); one standard atmosphere is 101.325 kPa (ISO 2533).
const SEA_LEVEL_KPA = 101.325;

describe("liveReadouts", () => {
  it("shows condensing, evaporating, subcooling and superheat for a worked R-134a case (Tillner-Roth & Baehr 1994)", () => {
    const lines = liveReadouts(
      "running",
      {
        highKpaGauge: 1317.905 - SEA_LEVEL_KPA,
        lowKpaGauge: 292.803 - SEA_LEVEL_KPA,
        liquidLineC: 45,
        suctionLineC: 8,
        ventC: 9,
      },
      { refrigerant: "R-134a", expansionDevice: "txv", ambientC: 35 },
    );
    expect(lines.highKpaGauge?.[0]?.text).toBe("Condensing at 50.0 °C, 15.0 K above the air");
    expect(lines.lowKpaGauge?.[0]?.text).toBe("Evaporating at 0.0 °C");
    const { low, high } = SUBCOOLING_K.txv;
    expect(lines.liquidLineC).toEqual([
      { text: `Subcooling 5.0 K (typical for a TXV system ${low}–${high} K)`, status: "inside" },
    ]);
    expect(lines.suctionLineC?.[0]?.text).toMatch(/^Superheat 8\.0 K/);
    expect(lines.ventC).toEqual([{ text: "26.0 K below the air temperature" }]);
  });

  it("says why an R-744 high side above the critical pressure has no condensing temperature (Span & Wagner 1996)", () => {
    const lines = liveReadouts(
      "running",
      { highKpaGauge: 9000, liquidLineC: 40 },
      { refrigerant: "R-744", expansionDevice: "txv", ambientC: 35 },
    );
    expect(lines.highKpaGauge).toEqual([
      { text: expect.stringMatching(/critical pressure/), status: "unknown" },
    ]);
    expect(lines.liquidLineC?.[0]?.status).toBe("unknown");
  });

  it("judges a static reading against saturation at ambient (Tillner-Roth & Baehr 1994: 665.381 kPa abs at 25 °C)", () => {
    const lines = liveReadouts(
      "static",
      { staticKpaGauge: 665.381 - SEA_LEVEL_KPA },
      { refrigerant: "R-134a", ambientC: 25 },
    );
    expect(lines.staticKpaGauge?.[0]?.text).toBe("Saturation at 25.0 °C ambient: 564 kPa gauge");
    expect(lines.staticKpaGauge?.[1]).toMatchObject({ status: "inside", verdict: "no sign of air" });
  });

  it("says every number in an imperial reader's units (NIST SP 811 factors)", () => {
    const lines = markedReadouts(
      "running",
      { highKpaGauge: 1317.905 - SEA_LEVEL_KPA, liquidLineC: 45, ventC: 9 },
      { refrigerant: "R-134a", expansionDevice: "txv", ambientC: 35 },
    );
    const imperial = unitsOfSystem("imperial");
    // 50 °C is 122 °F; a 15 K difference is 27 °F; 26 K is 46.8 °F.
    expect(sayInUnits(lines.highKpaGauge![0]!.text, imperial)).toBe(
      "Condensing at 122.0 °F, 27.0 °F above the air",
    );
    expect(sayInUnits(lines.ventC![0]!.text, imperial)).toBe("46.8 °F below the air temperature");
    expect(sayInUnits(lines.highKpaGauge![1]!.text, imperial)).toMatch(/^Expected \d+–\d+ psig for this air/);
    for (const list of Object.values(lines))
      for (const line of list) expect(sayInUnits(line.text, imperial)).not.toMatch(/kPa|°C| K\b/);
  });

  it("computes nothing before the refrigerant is known", () => {
    expect(liveReadouts("running", { highKpaGauge: 1200 }, { ambientC: 30 })).toEqual({});
  });
});

describe("one physics path", () => {
  it("the readouts' numbers are the findings engine's numbers for the same readings (property over running reading sets)", () => {
    const reading = (min: number, max: number) =>
      fc.integer({ min: min * 10, max: max * 10 }).map((tenths) => tenths / 10);
    const numRuns = propertyRuns(400);
    let compared = 0;
    fc.assert(
      fc.property(
        fc.constantFrom(...SERVICE_REFRIGERANT_IDS),
        fc.constantFrom("orifice_tube" as const, "txv" as const),
        reading(10, 45),
        fc.option(reading(-300, 1800), { nil: undefined }),
        reading(50, 3500),
        reading(0, 900),
        reading(10, 80),
        reading(-20, 30),
        (
          refrigerant,
          expansionDevice,
          ambientC,
          altitudeM,
          highKpaGauge,
          lowKpaGauge,
          liquidLineC,
          suctionLineC,
        ) => {
          const readings = { ambientC, altitudeM, highKpaGauge, lowKpaGauge, liquidLineC, suctionLineC };
          const physics = runningPhysics({ refrigerant, ...readings });
          const { computed } = diagnose({ refrigerant, expansionDevice, ...readings });
          expect(physics.condensingC).toBe(computed.condensingC);
          expect(physics.evaporatingC).toBe(computed.evaporatingC);
          expect(physics.subcoolingK).toBe(computed.subcoolingK);
          expect(physics.condensingApproachK).toBe(computed.condensingApproachK);
          expect(physics.liftK).toBe(computed.liftK);
          // The engine grades no superheat on a low side in vacuum; everywhere else the two agree.
          if (lowKpaGauge > 0) expect(physics.superheatK).toBe(computed.superheatK);
          if (physics.subcoolingK !== undefined && physics.superheatK !== undefined) compared += 1;
        },
      ),
      { numRuns },
    );
    // Most reading sets lie inside the tables; make sure the comparison was not vacuous.
    expect(compared).toBeGreaterThan(numRuns / 4);
  });
});
