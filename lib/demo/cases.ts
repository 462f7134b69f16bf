import type { CaseStatus, JsonObject, JsonValue, ReadingSetKind, SignOffVerdict } from "@/models";

// Invented demo cases. Pressures are gauge kPa as read at the vehicle; the values are plausible
// for the conditions (from memory), not measurements. Findings carry engineVersion "demo-seed"
// so nobody mistakes them for output of the diagnosis engine.

export type DemoReadingSet = {
  kind: ReadingSetKind;
  minutesIn: number;
  ambientC: number;
  relativeHumidityPct: number | null;
  engineRpm: number | null;
  staticKpaGauge?: number;
  highKpaGauge?: number;
  lowKpaGauge?: number;
  liquidLineC?: number;
  suctionLineC?: number;
  ventC?: number;
};

export type DemoSignOff = {
  reviewerKey: string;
  verdict: SignOffVerdict;
  comment: string;
  minutesIn: number;
};

export type DemoCase = {
  key: string;
  shopKey: string;
  vehicleKey: string;
  technicianKey: string;
  status: CaseStatus;
  daysAgo: number;
  complaint: string;
  symptomTags: string[];
  interviewStep: string | null;
  answers: JsonObject;
  findings: JsonValue | null;
  conclusionCause: string | null;
  conclusionNotes: string | null;
  confirmedRepair: string | null;
  submittedMinutesIn: number | null;
  readingSets: DemoReadingSet[];
  signOffs: DemoSignOff[];
};

const suspect = (cause: string, score: number, evidenceFor: string[], evidenceAgainst: string[]) => ({
  cause,
  score,
  evidenceFor,
  evidenceAgainst,
});

export const demoCases: DemoCase[] = [
  {
    key: "focus-low-charge",
    shopKey: "harbourline",
    vehicleKey: "focus",
    technicianKey: "apprentice",
    status: "closed",
    daysAgo: 12,
    complaint:
      "Air is only cool at highway speed and turns warm at idle; compressor clicks on and off every few seconds.",
    symptomTags: ["warm_at_idle", "rapid_clutch_cycling"],
    interviewStep: "findings",
    answers: { clutchCycling: "rapid", highPressureCutOut: false, frostLocation: "none", noises: [] },
    findings: [
      suspect(
        "undercharge",
        0.78,
        ["low side well below normal", "high superheat at the accumulator outlet", "rapid clutch cycling"],
        [],
      ),
      suspect(
        "restriction",
        0.12,
        ["low side low"],
        ["high side also low", "no temperature drop across a component"],
      ),
    ],
    conclusionCause: "undercharge",
    conclusionNotes:
      "Both sides low with high superheat and rapid cycling. Static pressure matches ambient, so there is refrigerant left; looking for the leak.",
    confirmedRepair:
      "Oily residue at the condenser inlet fitting, confirmed with an electronic detector. Replaced the O-ring, recovered 310 g, evacuated, vacuum held 15 min, recharged 570 g by weight.",
    submittedMinutesIn: 55,
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
        liquidLineC: 31,
        suctionLineC: 14,
        ventC: 17,
      },
      {
        kind: "final",
        minutesIn: 160,
        ambientC: 28,
        relativeHumidityPct: 58,
        engineRpm: 1500,
        highKpaGauge: 1350,
        lowKpaGauge: 210,
        liquidLineC: 44,
        suctionLineC: 6,
        ventC: 6,
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
  },
  {
    key: "crv-warms-on-highway",
    shopKey: "harbourline",
    vehicleKey: "crv",
    technicianKey: "apprentice",
    status: "awaiting_signoff",
    daysAgo: 1,
    complaint:
      "Cold for the first 15–20 minutes on the highway, then the centre vents go warm; cold again after the car has been parked for a while.",
    symptomTags: ["intermittent_cooling", "warm_after_driving"],
    interviewStep: "findings",
    answers: {
      clutchCycling: "normal",
      highPressureCutOut: false,
      frostLocation: "none",
      intermittent: true,
      noises: [],
    },
    findings: [
      suspect(
        "moisture",
        0.56,
        ["low side falls toward vacuum once the vents warm", "recovers after the system rests"],
        ["no identifier result yet"],
      ),
      suspect(
        "expansion_device",
        0.27,
        ["low side falls while the high side holds"],
        ["recovers without intervention"],
      ),
      suspect(
        "evaporator_icing",
        0.12,
        ["cooling fades after a long run"],
        ["vent temperature was not near freezing before it warmed"],
      ),
    ],
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
  },
  {
    key: "silverado-warm-at-idle",
    shopKey: "harbourline",
    vehicleKey: "silverado",
    technicianKey: "apprentice",
    status: "sent_back",
    daysAgo: 4,
    complaint: "Front vents fine on the road but warm sitting in traffic; rear unit never gets very cold.",
    symptomTags: ["warm_at_idle", "rear_weak"],
    interviewStep: "findings",
    answers: {
      clutchCycling: "none",
      highPressureCutOut: true,
      frostLocation: "none",
      noises: ["fan roar at idle"],
    },
    findings: [
      suspect(
        "condenser_airflow",
        0.44,
        ["high side far above normal at idle", "high side falls with road speed"],
        [],
      ),
      suspect("overcharge", 0.34, ["high side high", "low side high"], ["high side recovers at 1800 rpm"]),
      suspect("non_condensables", 0.15, ["high side high"], ["no static check against ambient yet"]),
    ],
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
  },
  {
    key: "rav4-weak-in-traffic",
    shopKey: "harbourline",
    vehicleKey: "rav4",
    technicianKey: "tech",
    status: "draft",
    daysAgo: 0,
    complaint: "Weak cooling in stop-and-go traffic and a musty smell for the first minute after start-up.",
    symptomTags: ["weak_in_traffic", "odour"],
    interviewStep: "running_readings",
    answers: { highVoltageSystemAcknowledged: true },
    findings: null,
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
  },
  {
    key: "ranger-afternoon-fade",
    shopKey: "ridgeback",
    vehicleKey: "ranger",
    technicianKey: "owner",
    status: "draft",
    daysAgo: 2,
    complaint: "Cools well in the morning, weak on hot afternoons after an hour of driving.",
    symptomTags: ["weak_when_hot"],
    interviewStep: "running_readings",
    answers: {},
    findings: null,
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
        staticKpaGauge: 715,
      },
    ],
    signOffs: [],
  },
];
