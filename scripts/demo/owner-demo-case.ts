import type { DemoCase } from "./case-types";

// An invented case the owner page demo starts from: a technician's own diagnosis (so it is
// signed off on submission), overcharged after a top-up elsewhere, with a repair proposed.
// Readings are plausible for the conditions (saturation values from memory), not measurements.
export const mazdaOvercharge: DemoCase = {
  key: "cx5-overcharged-after-top-up",
  shopKey: "harbourline",
  vehicleKey: "cx5",
  technicianKey: "tech",
  status: "signed_off",
  daysAgo: 3,
  complaint:
    "Since a top-up at a quick-service place last month the air is warm in traffic and only cool once moving; a loud click from the engine bay now and then.",
  interviewStep: "findings",
  answers: {
    complaint: { ownerWords: "Warm in traffic since last month's top-up, clicks now and then." },
    system: {
      refrigerant: "R-134a",
      expansionDevice: "txv",
      compressorType: "variable_displacement",
      labelChargeG: 450,
      oilType: "pag",
    },
    conditions: { ambientC: 30, relativeHumidityPct: 55, engineRpm: 1500 },
    static: { staticKpaGauge: 670 },
    running: { highKpaGauge: 2050, lowKpaGauge: 310, liquidLineC: 52, suctionLineC: 11, ventC: 16 },
    behaviour: { symptoms: ["recent_service_elsewhere", "worse_at_idle", "high_pressure_cutout"] },
    identification: { purityPct: 99.3, airPct: 0.4 },
    chargeAudit: { recovered: true, recoveredChargeG: 565, oilRemovedMl: 8 },
  },
  diagnosed: true,
  conclusionCause: "overcharge",
  conclusionNotes:
    "High side about 2050 kPa at 30 °C with high subcooling; fan runs. Recovered 565 g against a 450 g label.",
  confirmedRepair: null,
  submittedMinutesIn: 60,
  readingSets: [
    {
      kind: "static",
      minutesIn: 5,
      ambientC: 30,
      relativeHumidityPct: 55,
      engineRpm: null,
      staticKpaGauge: 670,
    },
    {
      kind: "running",
      minutesIn: 15,
      ambientC: 30,
      relativeHumidityPct: 55,
      engineRpm: 1500,
      highKpaGauge: 2050,
      lowKpaGauge: 310,
      liquidLineC: 52,
      suctionLineC: 11,
      ventC: 16,
    },
  ],
  signOffs: [],
};
