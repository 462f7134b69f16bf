/**
 * Number formatting for evidence sentences: fixed decimals, a real minus sign, thousands grouped
 * except where `grouped` is false (pressures, which lib/units/quantity.ts says with plain digits).
 */
const SCALE = [1, 10, 100, 1000] as const;

function group(whole: number): string {
  if (whole < 1000) return String(whole);
  const head = Math.floor(whole / 1000);
  const tail = whole - head * 1000;
  return `${group(head)},${tail < 10 ? "00" : tail < 100 ? "0" : ""}${tail}`;
}

// Hand-rolled rather than toFixed/toLocaleString: evidence sentences are built on every diagnosis.
function fixed(value: number, decimals: 0 | 1 | 2 | 3, grouped = true): string {
  const scale = SCALE[decimals];
  const scaled = Math.round(Math.abs(value) * scale);
  const whole = Math.floor(scaled / scale);
  let text = grouped ? group(whole) : String(whole);
  if (decimals > 0) {
    const fraction = String(scaled - whole * scale);
    text += `.${"0".repeat(decimals - fraction.length)}${fraction}`;
  }
  return value < 0 && scaled !== 0 ? `−${text}` : text;
}

export const degC = (value: number) => `${fixed(value, 1)} °C`;
export const kelvin = (value: number) => `${fixed(value, 1)} K`;
export const grams = (value: number) => `${fixed(value, 0)} g`;
export const pct = (value: number) => `${fixed(value, Number.isInteger(value) ? 0 : 1)} %`;
export const plain = (value: number, decimals: 0 | 1 | 2 | 3, grouped = true) =>
  fixed(value, decimals, grouped);
