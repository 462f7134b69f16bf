import type { RefrigerantId } from "./catalog";

export interface Caution {
  id: string;
  text: string;
}

// Wording is ours; the hazards are those every refrigerant's safety data sheet and ASHRAE Standard 34 name.
const EVERY_REFRIGERANT: readonly Caution[] = [
  {
    id: "eyes_skin",
    text: "Wear safety glasses and gloves whenever a hose or line is connected or opened: liquid refrigerant boils off fast enough to freeze skin and eyes, even when the gauges read empty.",
  },
  {
    id: "no_venting",
    text: "Never vent refrigerant. Recover it with equipment approved for this refrigerant, following local regulations and your certification.",
  },
  {
    id: "pressure",
    text: "The system is under pressure, even with the engine off. Use rated hoses and couplers and never pressure-test with compressed air or oxygen.",
  },
  {
    id: "defer",
    text: "These figures support a diagnosis; the vehicle manufacturer's procedure, local codes and certified practice take precedence.",
  },
];

const BY_REFRIGERANT: Record<RefrigerantId, readonly Caution[]> = {
  "R-134a": [],
  "R-1234yf": [
    {
      id: "flammable",
      text: "R-1234yf is mildly flammable (ASHRAE 34 class A2L). Keep sparks, flames and hot surfaces away, ventilate the bay, and use only equipment certified for R-1234yf.",
    },
  ],
  "R-744": [
    {
      id: "very_high_pressure",
      text: "R-744 (CO2) systems run at many times the pressure of R-134a systems. Use only R-744 rated gauges, hoses and service equipment and follow the manufacturer's procedure.",
    },
    {
      id: "asphyxiation",
      text: "CO2 is heavier than air and collects in pits and low spaces; a large release can cause suffocation. Ventilate and keep clear of low areas.",
    },
  ],
  "R-12": [
    {
      id: "ozone_depleting",
      text: "R-12 is an ozone-depleting substance. Recover it only with dedicated R-12 equipment and handle it as your local regulations require.",
    },
  ],
};

/** Cautions to show wherever a technician works on a system with this refrigerant, most specific first. */
export function refrigerantCautions(refrigerant: RefrigerantId): readonly Caution[] {
  return [...(BY_REFRIGERANT[refrigerant] ?? []), ...EVERY_REFRIGERANT];
}
