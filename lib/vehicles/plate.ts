// Licence plates as the shop types them: spaces, dashes and dots are left out and letters upper-cased,
// so "7kj-214" and "7KJ 214" find the same vehicle. Plates are at most 10 characters in the places
// we know of (from memory); 12 leaves room.

export const PLATE_MAX_CHARS = 12;

export function normalisePlate(raw: string): string {
  return raw.replace(/[\s.\-·]/g, "").toUpperCase();
}

/** null when the plate is usable, else why not. */
export function plateError(plate: string): string | null {
  if (plate.length > PLATE_MAX_CHARS) return `A plate has at most ${PLATE_MAX_CHARS} letters and digits.`;
  if (!/^[\p{L}\p{N}]*$/u.test(plate)) return "A plate has letters and digits only.";
  return null;
}

/** Only the digits of a phone number, as the search compares them. */
export function phoneDigits(raw: string): string {
  return raw.replace(/\D/g, "");
}
