import { standardBarometricKpa, STANDARD_ATMOSPHERE_KPA } from "@/lib/units/barometric";
import type { ServiceRefrigerantId } from "./catalog";

/*
 * The one home of the gauge limits: what a service gauge can read at all, and what each refrigerant's
 * system can hold. The interview's answer checks use them; the findings engine's input schema should too.
 */

/** A gauge cannot read below a perfect vacuum: one standard atmosphere below zero at sea level (ISO 2533). */
export const FULL_VACUUM_KPA_GAUGE = -STANDARD_ATMOSPHERE_KPA;

/** Above any mobile A/C pressure, R-744 high sides included (those run to about 13 MPa; from memory). */
export const MAX_READING_KPA_GAUGE = 16000;

/**
 * Above these an HFC or HFO system is past its high-side relief valve (SAE J639 systems relieve at about
 * 3.1–3.8 MPa, from memory); an R-744 system is held only to the plain reading limit.
 */
export const MAX_KPA_GAUGE_BY_REFRIGERANT: Readonly<Record<ServiceRefrigerantId, number>> = {
  "R-134a": 4500,
  "R-1234yf": 4500,
  "R-744": MAX_READING_KPA_GAUGE,
};

/**
 * A gauge reads against the local atmosphere, so a full vacuum reads minus the barometric pressure there
 * (US Standard Atmosphere 1976 through lib/units). undefined for an altitude the formula does not cover.
 */
export function fullVacuumKpaGauge(altitudeM: number): number | undefined {
  try {
    return -standardBarometricKpa(altitudeM);
  } catch {
    return undefined;
  }
}
