import type { DemoCase } from "./case-types";

// The invented mountain shop (1500 m): the same static pressure reads higher on the gauge than at sea level.
export const ridgebackCases: DemoCase[] = [
  {
    key: "ranger-afternoon-fade",
    shopKey: "ridgeback",
    vehicleKey: "ranger",
    technicianKey: "owner",
    status: "draft",
    daysAgo: 2,
    complaint: "Cools well in the morning, weak on hot afternoons after an hour of driving.",
    interviewStep: "running",
    answers: {
      complaint: { ownerWords: "Fine in the morning, weak in the afternoon heat." },
      system: {
        refrigerant: "R-134a",
        expansionDevice: "orifice_tube",
        compressorType: "cycling_clutch",
        labelChargeG: 630,
        oilType: "pag",
      },
      conditions: { ambientC: 31, relativeHumidityPct: 20 },
      static: { staticKpaGauge: 708 },
    },
    diagnosed: false,
    conclusionCause: null,
    conclusionNotes: null,
    confirmedRepair: null,
    submittedMinutesIn: null,
    readingSets: [
      {
        kind: "static",
        minutesIn: 6,
        ambientC: 31,
        relativeHumidityPct: 20,
        engineRpm: null,
        staticKpaGauge: 708,
      },
    ],
    signOffs: [],
  },
];
