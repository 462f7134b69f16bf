import type { DemoCase } from "./case-types";

// Invented cases at the invented Harbourline shop (sea level). Gauge readings are plausible for the
// conditions (saturation values from memory), not measurements from any vehicle.

const focus: DemoCase = {
  key: "focus-low-charge",
  shopKey: "harbourline",
  vehicleKey: "focus",
  technicianKey: "apprentice",
  status: "closed",
  daysAgo: 12,
  complaint:
    "Air is only cool at highway speed and turns warm at idle; the compressor clicks on and off every few seconds.",
  interviewStep: "findings",
  answers: {
    complaint: { ownerWords: "Only cool on the highway, warm at idle, clicking from the engine bay." },
    system: {
      refrigerant: "R-134a",
      expansionDevice: "orifice_tube",
      compressorType: "cycling_clutch",
      labelChargeG: 570,
      oilType: "pag",
    },
    conditions: { ambientC: 29, relativeHumidityPct: 60, engineRpm: 1500 },
    static: { staticKpaGauge: 645 },
    running: { highKpaGauge: 880, lowKpaGauge: 95, liquidLineC: 37, suctionLineC: 14, ventC: 17 },
    behaviour: { symptoms: ["clutch_rapid_cycling", "worse_at_idle", "oil_residue_at_fitting"] },
    identification: { purityPct: 99.4, airPct: 0.3 },
    chargeAudit: { recovered: true, recoveredChargeG: 430, oilRemovedMl: 12 },
  },
  diagnosed: true,
  conclusionCause: "undercharge",
  conclusionNotes:
    "Both sides low, high superheat and rapid cycling. Static pressure matches ambient, so some charge is left; recovered 430 g against a 570 g label.",
  confirmedRepair:
    "Oily residue on the condenser core, leak confirmed with an electronic detector. Replaced the condenser, put back the 12 mL drained plus the part's oil allowance, evacuated, vacuum held 10 min, recharged 572 g against the 570 g label.",
  submittedMinutesIn: 55,
  // The repair itself (recovery, new condenser, vacuum hold, recharge, final readings) is the
  // service record the service-side demo adds, between sign-off and closing.
  closedMinutesIn: 215,
  outcome: {
    causes: ["undercharge"],
    repairIds: ["leak_repair", "replace_condenser", "recover_evacuate_recharge"],
    note: "Leak at the condenser core.",
  },
  readingSets: [
    {
      kind: "static",
      minutesIn: 10,
      ambientC: 29,
      relativeHumidityPct: 60,
      engineRpm: null,
      staticKpaGauge: 645,
    },
    {
      kind: "running",
      minutesIn: 20,
      ambientC: 29,
      relativeHumidityPct: 60,
      engineRpm: 1500,
      highKpaGauge: 880,
      lowKpaGauge: 95,
      liquidLineC: 37,
      suctionLineC: 14,
      ventC: 17,
    },
  ],
  signOffs: [
    {
      reviewerKey: "senior",
      verdict: "signed_off",
      comment: "Agreed. Good call checking static pressure against ambient first.",
      minutesIn: 80,
    },
  ],
};

const crv: DemoCase = {
  key: "crv-fades-on-highway",
  shopKey: "harbourline",
  vehicleKey: "crv",
  technicianKey: "apprentice",
  status: "awaiting_signoff",
  daysAgo: 1,
  complaint:
    "Cold for the first 15–20 minutes on the highway, then the centre vents go warm; cold again after the car has been parked for a while.",
  interviewStep: "findings",
  answers: {
    complaint: { ownerWords: "Goes warm after twenty minutes of highway driving, fine again after a stop." },
    system: {
      refrigerant: "R-1234yf",
      expansionDevice: "txv",
      compressorType: "variable_displacement",
      labelChargeG: 450,
      oilType: "pag",
    },
    conditions: { ambientC: 26, relativeHumidityPct: 70, engineRpm: 2000 },
    static: { staticKpaGauge: 600 },
    running: { highKpaGauge: 1150, lowKpaGauge: 190, liquidLineC: 41, suctionLineC: 5, ventC: 5 },
    behaviour: { symptoms: ["cooling_fades_then_returns", "low_side_swings_to_vacuum"] },
    identification: { purityPct: 99.2, airPct: 0.5 },
  },
  diagnosed: true,
  conclusionCause: "moisture",
  conclusionNotes:
    "Low side drops from about 190 to 15 kPa when the vents go warm and comes back after a rest. I think moisture is freezing at the TXV. Plan: recover, replace the desiccant, long evacuation.",
  confirmedRepair: null,
  submittedMinutesIn: 70,
  readingSets: [
    {
      kind: "static",
      minutesIn: 5,
      ambientC: 26,
      relativeHumidityPct: 70,
      engineRpm: null,
      staticKpaGauge: 600,
    },
    {
      kind: "running",
      minutesIn: 15,
      ambientC: 26,
      relativeHumidityPct: 70,
      engineRpm: 2000,
      highKpaGauge: 1150,
      lowKpaGauge: 190,
      liquidLineC: 41,
      suctionLineC: 5,
      ventC: 5,
    },
    {
      kind: "running",
      minutesIn: 40,
      ambientC: 26,
      relativeHumidityPct: 70,
      engineRpm: 2000,
      highKpaGauge: 1050,
      lowKpaGauge: 15,
      liquidLineC: 40,
      suctionLineC: 11,
      ventC: 19,
    },
  ],
  signOffs: [],
};

const silverado: DemoCase = {
  key: "silverado-warm-at-idle",
  shopKey: "harbourline",
  vehicleKey: "silverado",
  technicianKey: "apprentice",
  status: "sent_back",
  daysAgo: 4,
  complaint: "Front vents fine on the road but warm sitting in traffic; the rear unit never gets very cold.",
  interviewStep: "findings",
  answers: {
    complaint: { ownerWords: "Warm in traffic, rear air weak." },
    system: {
      refrigerant: "R-134a",
      expansionDevice: "orifice_tube",
      compressorType: "cycling_clutch",
      labelChargeG: 1130,
      oilType: "pag",
    },
    conditions: { ambientC: 33, relativeHumidityPct: 45, engineRpm: 800 },
    running: { highKpaGauge: 2150, lowKpaGauge: 330, liquidLineC: 62, suctionLineC: 14, ventC: 15 },
    behaviour: { symptoms: ["worse_at_idle", "high_pressure_cutout"] },
  },
  skipped: ["static"],
  diagnosed: true,
  conclusionCause: "overcharge",
  conclusionNotes:
    "High side over 2100 kPa at idle and the low side is high too. Suspect overcharge from the last service; want to recover and weigh.",
  confirmedRepair: null,
  submittedMinutesIn: 45,
  readingSets: [
    {
      kind: "running",
      minutesIn: 10,
      ambientC: 33,
      relativeHumidityPct: 45,
      engineRpm: 800,
      highKpaGauge: 2150,
      lowKpaGauge: 330,
      liquidLineC: 62,
      suctionLineC: 14,
      ventC: 15,
    },
    {
      kind: "running",
      minutesIn: 20,
      ambientC: 33,
      relativeHumidityPct: 45,
      engineRpm: 1800,
      highKpaGauge: 1650,
      lowKpaGauge: 250,
      liquidLineC: 52,
      suctionLineC: 9,
      ventC: 9,
    },
  ],
  signOffs: [
    {
      reviewerKey: "senior",
      verdict: "sent_back",
      comment:
        "The high side falls once the engine speeds up, so check the condenser airflow first: fan clutch, and debris between condenser and radiator. Then take a static reading against ambient before anything is recovered.",
      minutesIn: 90,
    },
  ],
};

const rav4: DemoCase = {
  key: "rav4-weak-in-traffic",
  shopKey: "harbourline",
  vehicleKey: "rav4",
  technicianKey: "tech",
  status: "draft",
  daysAgo: 0,
  complaint: "Weak cooling in stop-and-go traffic and a musty smell for the first minute after start-up.",
  interviewStep: "running",
  answers: {
    complaint: { ownerWords: "Weak in traffic, smells musty at start-up." },
    system: {
      refrigerant: "R-1234yf",
      expansionDevice: "txv",
      compressorType: "electric",
      labelChargeG: 480,
      oilType: "poe",
    },
    conditions: { ambientC: 24, relativeHumidityPct: 65 },
    static: { staticKpaGauge: 560 },
  },
  diagnosed: false,
  conclusionCause: null,
  conclusionNotes: null,
  confirmedRepair: null,
  submittedMinutesIn: null,
  readingSets: [
    {
      kind: "static",
      minutesIn: 8,
      ambientC: 24,
      relativeHumidityPct: 65,
      engineRpm: null,
      staticKpaGauge: 560,
    },
  ],
  signOffs: [],
};

export const harbourlineCases: DemoCase[] = [focus, crv, silverado, rav4];
