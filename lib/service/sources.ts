/**
 * Where each service-record rule comes from. Every computed verdict carries one of
 * these strings so the screen (and a reviewer) can see what the number rests on.
 * Only published standards and regulations, papers and reference data, and public-domain
 * government technical manuals are named. "common practice" marks a trade rule of thumb;
 * "from memory" marks a recalled value that has not been checked against such a text.
 */
export const SERVICE_SOURCES = {
  j2788Recovery:
    "SAE J2788 recovery test: the machine must recover at least 95 % of the charge in 30 min (also adopted by US EPA, 40 CFR 82 Subpart B App. C)",
  j2843Recovery:
    "SAE J2843 recovery requirement: at least 95 % of the charge recovered — from memory, not checked against the standard's text",
  j2843ChargeAccuracy:
    "SAE J2843 recharge accuracy of ½ oz (about 15 g) — from memory, not checked against the standard's text",
  j2788ChargeAccuracy:
    "SAE J2788 charge accuracy of ±15 g (½ oz) — from memory, not checked against the standard's text",
  noChargeStandard:
    "common practice — no SAE charge-accuracy figure on hand for this refrigerant; ½ oz (15 g) used by analogy with SAE J2788/J2843",
  oilCirculation: "common practice — circulating refrigerant carries roughly 4 % oil by mass",
  pagDensity: "from memory — PAG compressor oil density about 0.99 g/mL at room temperature",
  compressorSump: "common practice — a passenger-car compressor sump holds roughly 60–90 mL of oil",
  partOilAllowance:
    "common practice, from memory — typical oil carried by a replaced part; the vehicle maker's figure governs",
  oilAddBack:
    "US Army TM 5-3810-307-24-1-2 ch. 9: measure the oil the recovery machine drained and add that amount back",
  dielectricOil:
    "SAE J2788H (no oil injection for electric-compressor vehicles), from memory; about 1 % PAG in the oil can compromise compressor insulation — from memory; the vehicle maker's oil specification governs",
  vacuumTarget:
    "US Army TM 5-3805-296-23-4 WP 0248: 28–29 inHg vacuum at sea level, about 1 inHg less per 1000 ft of altitude",
  standardAtmosphere:
    "US Standard Atmosphere 1976, as given in ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 3",
  waterBoiling:
    "ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 6 (Hyland & Wexler 1983): saturation pressure of water; US Army TM 5-3805-296-23-4 WP 0248 table",
  vacuumHold:
    "US Army TM 5-2420-230-24-1 and TM 5-3805-296-23-4 WP 0248 field practice: no more than 2 inHg lost in 5 min",
  inchOfMercury: "NIST SP 811 (2008) App. B: 1 inHg (0 °C) = 3.386389 kPa",
  ounce: "NIST SP 811 (2008) App. B: 1 oz (avoirdupois) = 28.349523125 g, 1 lb = 453.59237 g",
  fluidOunce: "NIST SP 811 (2008) App. B: 1 US fluid ounce = 29.5735295625 mL",
  recoveryCylinderFill: "common practice: fill a recovery cylinder to no more than 80 % of its capacity",
} as const;

export type ServiceSourceId = keyof typeof SERVICE_SOURCES;
