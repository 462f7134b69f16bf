// Vehicle identification numbers: 17 characters, never I, O or Q (ISO 3779; 49 CFR 565.12).
// Position 9 is a check digit for vehicles built for North America (49 CFR 565.15); elsewhere it
// may be any character, so a mismatch is reported as a warning, never a rejection.

const VIN_PATTERN = /^[A-HJ-NPR-Z0-9]{17}$/;

// 49 CFR 565.15 Table I (transliteration) and Table II (position weights).
const TRANSLITERATION: Record<string, number> = {
  A: 1,
  B: 2,
  C: 3,
  D: 4,
  E: 5,
  F: 6,
  G: 7,
  H: 8,
  J: 1,
  K: 2,
  L: 3,
  M: 4,
  N: 5,
  P: 7,
  R: 9,
  S: 2,
  T: 3,
  U: 4,
  V: 5,
  W: 6,
  X: 7,
  Y: 8,
  Z: 9,
};
const WEIGHTS = [8, 7, 6, 5, 4, 3, 2, 10, 0, 9, 8, 7, 6, 5, 4, 3, 2];

export function normaliseVin(raw: string): string {
  return raw.replace(/[\s-]/g, "").toUpperCase();
}

export function vinFormatError(vin: string): string | null {
  if (vin.length !== 17) return `A VIN has 17 characters; this one has ${vin.length}.`;
  if (/[IOQ]/.test(vin)) return "A VIN never contains the letters I, O or Q — they are usually 1 and 0.";
  if (!VIN_PATTERN.test(vin)) return "A VIN holds only letters and digits.";
  return null;
}

export function vinCheckDigit(vin: string): string {
  let sum = 0;
  for (let i = 0; i < 17; i++) {
    const ch = vin[i]!;
    const value = /[0-9]/.test(ch) ? Number(ch) : (TRANSLITERATION[ch] ?? 0);
    sum += value * WEIGHTS[i]!;
  }
  const remainder = sum % 11;
  return remainder === 10 ? "X" : String(remainder);
}

export function vinCheckDigitMatches(vin: string): boolean {
  return vinFormatError(vin) === null && vin[8] === vinCheckDigit(vin);
}
