import type { InterviewAnswers } from "./answers";

/*
 * An invented case for tests and the demo: a 2014 Ford Escape at a made-up shop on a hot afternoon.
 * Pressures are plausible for R-134a at 32 °C, not taken from any vehicle's records.
 */
export const exampleAnswers = {
  complaint: { ownerWords: "Cold first thing in the morning, lukewarm by the time I get to work." },
  system: {
    refrigerant: "R-134a",
    expansionDevice: "orifice_tube",
    compressorType: "variable_displacement",
    labelChargeG: 570,
    oilType: "pag",
  },
  conditions: { ambientC: 32, relativeHumidityPct: 55, engineRpm: 1500 },
  static: { staticKpaGauge: 715 },
  running: { highKpaGauge: 1550, lowKpaGauge: 210, liquidLineC: 48, suctionLineC: 7, ventC: 9 },
  behaviour: { symptoms: ["cooling_fades_then_returns"] },
  identification: { purityPct: 99.6, airPct: 0.4 },
  chargeAudit: { recovered: true, recoveredChargeG: 530, oilRemovedMl: 12 },
} satisfies InterviewAnswers;

/** The same vehicle after a hose failure: the static gauge reads nothing. */
export const emptySystemAnswers = {
  ...exampleAnswers,
  static: { staticKpaGauge: 0 },
  running: undefined,
  behaviour: undefined,
  leakFinding: { method: "uv_dye", whereFound: "hose", notes: "Dye at the crimp of the suction hose." },
} satisfies InterviewAnswers;

/** A charge that fails identification: topped up with something else somewhere. */
export const contaminatedAnswers = {
  ...exampleAnswers,
  identification: { purityPct: 91, airPct: 2.5, hydrocarbonFlagged: false },
} satisfies InterviewAnswers;
