import type { DemoCase, DemoReadingSet } from "./case-types";

// Invented cases (their vehicles are at the end of vehicles.ts) that give the casebook something to find: closed cases with confirmed causes and repairs,
// a van that came back within the comeback window, and a case at the other shop with the same readings
// that Harbourline must never see. Readings are plausible for the conditions (from memory), not measured.

type Running = {
  highKpaGauge: number;
  lowKpaGauge: number;
  liquidLineC: number;
  suctionLineC: number;
  ventC: number;
};

/** A closed or submitted R-134a orifice-tube case whose interview reached the findings. */
function orificeCase(c: {
  key: string;
  shopKey: string;
  vehicleKey: string;
  technicianKey: string;
  status: DemoCase["status"];
  daysAgo: number;
  complaint: string;
  ownerWords: string;
  labelChargeG: number;
  ambientC: number;
  running: Running;
  symptoms: string[];
  conclusionCause: string;
  conclusionNotes: string;
  confirmedRepair?: string;
  outcome?: DemoCase["outcome"];
}): DemoCase {
  const reading: DemoReadingSet = {
    kind: "running",
    minutesIn: 15,
    ambientC: c.ambientC,
    relativeHumidityPct: 50,
    engineRpm: 800,
    ...c.running,
  };
  return {
    key: c.key,
    shopKey: c.shopKey,
    vehicleKey: c.vehicleKey,
    technicianKey: c.technicianKey,
    status: c.status,
    daysAgo: c.daysAgo,
    complaint: c.complaint,
    interviewStep: "findings",
    answers: {
      complaint: { ownerWords: c.ownerWords },
      system: {
        refrigerant: "R-134a",
        expansionDevice: "orifice_tube",
        compressorType: "cycling_clutch",
        labelChargeG: c.labelChargeG,
        oilType: "pag",
      },
      conditions: { ambientC: c.ambientC, relativeHumidityPct: 50, engineRpm: 800 },
      running: c.running,
      behaviour: { symptoms: c.symptoms as never },
    },
    skipped: ["static"],
    diagnosed: true,
    conclusionCause: c.conclusionCause,
    conclusionNotes: c.conclusionNotes,
    confirmedRepair: c.confirmedRepair ?? null,
    submittedMinutesIn: 40,
    ...(c.status === "closed" ? { closedMinutesIn: 180, outcome: c.outcome } : {}),
    readingSets: [reading],
    signOffs: [],
  };
}

const headPressureAtIdle: Running = {
  highKpaGauge: 2000,
  lowKpaGauge: 300,
  liquidLineC: 60,
  suctionLineC: 12,
  ventC: 14,
};

export const casebookCases: DemoCase[] = [
  orificeCase({
    key: "transit-fan-relay",
    shopKey: "harbourline",
    vehicleKey: "transit",
    technicianKey: "tech",
    status: "closed",
    daysAgo: 65,
    complaint: "Courier van blows warm at every stoplight and cools again once it gets moving.",
    ownerWords: "Warm at stoplights, fine once moving.",
    labelChargeG: 910,
    ambientC: 31,
    running: headPressureAtIdle,
    symptoms: ["worse_at_idle", "condenser_fan_not_running"],
    conclusionCause: "condenser_airflow",
    conclusionNotes: "High side near 2000 kPa at idle and the condenser fan never started with A/C on.",
    confirmedRepair:
      "Fan relay stuck open; replaced the relay and the high side dropped to about 1400 kPa at idle.",
    outcome: {
      causes: ["condenser_airflow"],
      repairIds: ["condenser_fan_repair"],
      note: "Relay in the under-hood box.",
    },
  }),
  orificeCase({
    key: "sierra-grille-debris",
    shopKey: "harbourline",
    vehicleKey: "sierra",
    technicianKey: "tech",
    status: "closed",
    daysAgo: 40,
    complaint:
      "Warm at stoplights in the afternoon, cold on the highway; a faint burning smell from the grille.",
    ownerWords: "Warm in town, cold on the highway, smell from the grille.",
    labelChargeG: 740,
    ambientC: 33,
    running: { highKpaGauge: 1900, lowKpaGauge: 290, liquidLineC: 57, suctionLineC: 11, ventC: 13 },
    symptoms: ["worse_at_idle"],
    conclusionCause: "condenser_airflow",
    conclusionNotes: "Head pressure high at idle, drops sharply with water on the condenser.",
    confirmedRepair:
      "Packed leaves and a plastic bag between condenser and radiator; cleaned and refitted the air seals.",
    outcome: { causes: ["condenser_airflow"], repairIds: ["clean_condenser"] },
  }),
  orificeCase({
    key: "malibu-bent-fins",
    shopKey: "harbourline",
    vehicleKey: "malibu",
    technicianKey: "tech",
    status: "closed",
    daysAgo: 25,
    complaint: "Only lukewarm air in the car park after work, better on the motorway.",
    ownerWords: "Lukewarm when parked, better when driving.",
    labelChargeG: 650,
    ambientC: 30,
    running: { highKpaGauge: 1850, lowKpaGauge: 280, liquidLineC: 56, suctionLineC: 11, ventC: 14 },
    symptoms: ["worse_at_idle"],
    conclusionCause: "condenser_airflow",
    conclusionNotes: "High side high at idle; fins flattened across the lower third of the condenser.",
    outcome: { causes: ["condenser_airflow"], repairIds: ["replace_condenser", "recover_evacuate_recharge"] },
  }),
  // Back within the window: the same van, the same readings, and a new complaint.
  orificeCase({
    key: "transit-warm-again",
    shopKey: "harbourline",
    vehicleKey: "transit",
    technicianKey: "tech",
    status: "signed_off",
    daysAgo: 3,
    complaint: "Van blows warm again at idle on the delivery route; the fan sounds quieter than it used to.",
    ownerWords: "Warm again at idle, fan quiet.",
    labelChargeG: 910,
    ambientC: 31,
    running: headPressureAtIdle,
    symptoms: ["worse_at_idle", "condenser_fan_not_running"],
    conclusionCause: "condenser_airflow",
    conclusionNotes:
      "Same readings as in the spring; fan not running again. Checking the fan motor this time.",
  }),
  // The other shop: the same readings, never shown to Harbourline.
  orificeCase({
    key: "tacoma-fan-motor",
    shopKey: "ridgeback",
    vehicleKey: "tacoma",
    technicianKey: "owner",
    status: "closed",
    daysAgo: 20,
    complaint: "Pickup runs warm at idle on the ranch road; the fan rattles.",
    ownerWords: "Warm at idle, fan rattles.",
    labelChargeG: 620,
    ambientC: 31,
    running: headPressureAtIdle,
    symptoms: ["worse_at_idle", "condenser_fan_not_running"],
    conclusionCause: "condenser_airflow",
    conclusionNotes: "Fan motor seized.",
    outcome: { causes: ["condenser_airflow"], repairIds: ["condenser_fan_repair"] },
  }),
];
