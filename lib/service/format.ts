/** Plain number formatting for the sentences a record shows (en-US grouping: "1,000 g"). */
const wholeNumber = new Intl.NumberFormat("en-US", { maximumFractionDigits: 0 });
const oneDecimal = new Intl.NumberFormat("en-US", { maximumFractionDigits: 1 });

export function formatGrams(massG: number): string {
  return `${wholeNumber.format(Math.abs(massG))} g`;
}

export function formatMillilitres(volumeMl: number): string {
  return `${wholeNumber.format(Math.abs(volumeMl))} mL`;
}

export function formatPercent(pct: number): string {
  return `${oneDecimal.format(Math.abs(pct))} %`;
}

export function formatNumber(value: number, maxFractionDigits = 1): string {
  return new Intl.NumberFormat("en-US", { maximumFractionDigits: maxFractionDigits }).format(value);
}
