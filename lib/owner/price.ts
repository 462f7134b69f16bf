/** A price in the currency's minor unit, shown the way an owner reads it ("$480.00", "CA$1,250.00"). */
export function formatPrice(priceMinor: number, currency: string): string {
  try {
    return new Intl.NumberFormat("en", { style: "currency", currency }).format(priceMinor / 100);
  } catch {
    return `${(priceMinor / 100).toFixed(2)} ${currency}`;
  }
}
