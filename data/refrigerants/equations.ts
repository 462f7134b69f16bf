/**
 * Published Wagner-form vapour-pressure equations, each with the critical point it was fitted with:
 *   ln(p / pc) = (Tc / T) · Σ nᵢ · θ^tᵢ,   θ = 1 − T / Tc
 * These are the ancillary equations that accompany each reference equation of state; they reproduce
 * that equation of state's saturation pressure to the stated deviation, which is far below what a
 * gauge can read.
 */
export interface VapourPressureEquation {
  /** The refrigerant's ASHRAE Standard 34 designation, as lib/refrigerants/catalog.ts lists it (which checks each one). */
  id: string;
  fileName: string;
  name: string;
  criticalTempK: number;
  criticalPressureKpaAbs: number;
  n: readonly number[];
  t: readonly number[];
  equation: string;
  source: string;
  deviation: string;
}

const WAGNER = "ln(p/pc) = (Tc/T) * sum(n_i * theta^t_i), theta = 1 - T/Tc";

export const VAPOUR_PRESSURE_EQUATIONS: readonly VapourPressureEquation[] = [
  {
    id: "R-134a",
    fileName: "r-134a.json",
    name: "R-134a (1,1,1,2-tetrafluoroethane)",
    criticalTempK: 374.21,
    criticalPressureKpaAbs: 4059.28,
    n: [-7.7513, 2.9263, -2.6622, -3.9711],
    t: [1, 1.5, 1.9, 4.25],
    equation: WAGNER,
    source:
      "Vapour-pressure ancillary equation for the reference equation of state of Tillner-Roth, R. & Baehr, H. D. (1994), J. Phys. Chem. Ref. Data 23, 657, with the critical point 374.21 K / 4.05928 MPa. Coefficients from memory: believed to be those of the NIST REFPROP fluid file, not confirmed against it; checked against the equation of state as stated under deviation.",
    deviation:
      "Measured against saturation pressures solved from the Tillner-Roth & Baehr 1994 equation of state on a 10 K grid from -40 to 100 °C: largest deviation 0.0044 % (at 30 °C); within 0.005 % of that paper's Table 8.",
  },
  {
    id: "R-1234yf",
    fileName: "r-1234yf.json",
    name: "R-1234yf (2,3,3,3-tetrafluoroprop-1-ene)",
    criticalTempK: 367.85,
    criticalPressureKpaAbs: 3382.2,
    n: [-7.4697, 2.7915, -2.1312, -2.9531],
    t: [1, 1.5, 1.8, 3.8],
    equation: WAGNER,
    source:
      "Vapour-pressure ancillary equation for the reference equation of state of Richter, M., McLinden, M. O. & Lemmon, E. W. (2011), J. Chem. Eng. Data 56, 3254, critical point 367.85 K / 3.3822 MPa. Coefficients from memory: believed to be those of the NIST REFPROP fluid file, not confirmed against it; checked against the equation of state as stated under deviation.",
    deviation:
      "Measured against saturation pressures solved from the Richter, McLinden & Lemmon 2011 equation of state on a 10 K grid from -40 to 90 °C: largest deviation 0.0055 % (at 90 °C).",
  },
  {
    id: "R-744",
    fileName: "r-744.json",
    name: "R-744 (carbon dioxide)",
    criticalTempK: 304.1282,
    criticalPressureKpaAbs: 7377.3,
    n: [-7.0602087, 1.9391218, -1.6463597, -3.2995634],
    t: [1, 1.5, 2, 4],
    equation: WAGNER,
    source:
      "Vapour-pressure equation 3.13 of Span, R. & Wagner, W. (1996), J. Phys. Chem. Ref. Data 25, 1509, fitted to their reference equation of state, critical point 304.1282 K / 7.3773 MPa.",
    deviation:
      "Measured against saturation pressures solved from the Span & Wagner 1996 equation of state on a 10 K grid from -40 to 30 °C: largest deviation 0.0040 % (at -10 °C); within 0.005 % of that paper's Table 34.",
  },
  {
    id: "R-12",
    fileName: "r-12.json",
    name: "R-12 (dichlorodifluoromethane)",
    criticalTempK: 385.12,
    criticalPressureKpaAbs: 4136.1,
    n: [-7.0834, 4.3562, -3.5249, -2.8872, -0.89926],
    t: [1, 1.5, 1.67, 4.14, 10],
    equation: WAGNER,
    source:
      "Vapour-pressure ancillary equation for the reference equation of state of Marx, V., Pruß, A. & Wagner, W. (1992), VDI Fortschr.-Ber. 19/57, critical point 385.12 K / 4.1361 MPa. Coefficients from memory: believed to be those of the NIST REFPROP fluid file, not confirmed against it; checked against the equation of state as stated under deviation.",
    deviation:
      "Measured against saturation pressures solved from the Marx, Pruß & Wagner 1992 equation of state on a 10 K grid from -40 to 100 °C: largest deviation 0.018 % (at 100 °C).",
  },
];

export function wagnerPressureKpaAbs(eq: VapourPressureEquation, tempK: number): number {
  const theta = 1 - tempK / eq.criticalTempK;
  let sum = 0;
  for (let i = 0; i < eq.n.length; i++) sum += eq.n[i]! * Math.pow(theta, eq.t[i]!);
  return eq.criticalPressureKpaAbs * Math.exp((eq.criticalTempK / tempK) * sum);
}
