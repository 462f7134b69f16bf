import type { RefrigerantId } from "@/lib/refrigerants";

/**
 * The published reference data Chillwright computes with, cited by author, year and where it appeared.
 * The credits page lists these beside the software; each computed result names its own source.
 */
export interface ReferencePublication {
  id: string;
  citation: string;
  /** What in Chillwright rests on it. */
  usedFor: string;
  /** The bundled saturation table that follows this publication, if any. */
  refrigerant?: RefrigerantId;
}

export const SATURATION_TABLE_PUBLICATIONS: readonly ReferencePublication[] = [
  {
    id: "tillner-roth-baehr-1994",
    citation: "Tillner-Roth, R. & Baehr, H. D. (1994). J. Phys. Chem. Ref. Data 23, 657.",
    usedFor:
      "R-134a saturation table: the reference equation of state its vapour-pressure equation follows and is checked against (with the paper's Table 8).",
    refrigerant: "R-134a",
  },
  {
    id: "richter-mclinden-lemmon-2011",
    citation: "Richter, M., McLinden, M. O. & Lemmon, E. W. (2011). J. Chem. Eng. Data 56, 3254.",
    usedFor:
      "R-1234yf saturation table: the reference equation of state its vapour-pressure equation follows and is checked against; the critical point.",
    refrigerant: "R-1234yf",
  },
  {
    id: "span-wagner-1996",
    citation: "Span, R. & Wagner, W. (1996). J. Phys. Chem. Ref. Data 25, 1509.",
    usedFor:
      "R-744 (CO₂) saturation table: the paper's vapour-pressure equation 3.13 and critical point, checked against its Table 34.",
    refrigerant: "R-744",
  },
  {
    id: "marx-pruss-wagner-1992",
    citation: "Marx, V., Pruß, A. & Wagner, W. (1992). Fortschr.-Ber. VDI, Reihe 19, Nr. 57.",
    usedFor:
      "R-12 saturation table: the reference equation of state its vapour-pressure equation follows and is checked against.",
    refrigerant: "R-12",
  },
  {
    id: "nist-refprop",
    citation: "Lemmon, E. W., Huber, M. L. & McLinden, M. O. NIST Standard Reference Database 23 (REFPROP).",
    usedFor:
      "Believed to be where the R-134a, R-1234yf and R-12 vapour-pressure coefficients were first published (from memory: not confirmed against it).",
  },
];

export const OTHER_REFERENCE_DATA: readonly ReferencePublication[] = [
  {
    id: "ashrae-fundamentals-2017",
    citation: "ASHRAE Handbook—Fundamentals (2017), chapter 1.",
    usedFor: "Dew point, wet bulb and the saturation pressure of water (the vacuum's boiling point).",
  },
  {
    id: "us-standard-atmosphere-1976",
    citation: "US Standard Atmosphere 1976 (NOAA, NASA and the US Air Force).",
    usedFor: "Barometric pressure from the shop's altitude: gauge readings and vacuum targets at altitude.",
  },
  {
    id: "nist-sp-811",
    citation: "NIST Special Publication 811 (2008 edition), appendix B.",
    usedFor: "Every unit conversion: psi, bar, inHg, ounces, pounds and fluid ounces.",
  },
];
