/**
 * Saturation pressure of water over liquid water, ASHRAE Handbook—Fundamentals (2017)
 * ch. 1 eq. 6 (Hyland & Wexler 1983), valid 0–200 °C. Written out here rather than
 * through PsychroLib so the vacuum checks carry no global unit-system state.
 */
const C8 = -5.8002206e3;
const C9 = 1.3914993;
const C10 = -4.8640239e-2;
const C11 = 4.1764768e-5;
const C12 = -1.4452093e-8;
const C13 = 6.5459673;

export function waterSaturationKpaAbs(tempC: number): number {
  if (!Number.isFinite(tempC) || tempC < 0 || tempC > 200) {
    throw new RangeError(`Water saturation pressure is computed for 0–200 °C only, got ${tempC} °C`);
  }
  const tK = tempC + 273.15;
  const lnPwsPa = C8 / tK + C9 + C10 * tK + C11 * tK ** 2 + C12 * tK ** 3 + C13 * Math.log(tK);
  return Math.exp(lnPwsPa) / 1000;
}
