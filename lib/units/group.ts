/**
 * "4660" → "4,660", "12500.5" → "12,500.5": figures read off scales and gauges are shown with
 * thousands separators (common practice). For display only: CSVs and field texts stay ungrouped.
 */
export function groupThousands(text: string): string {
  const [whole = "", fraction] = text.split(".");
  const groupedWhole = whole.replace(/\B(?=(\d{3})+(?!\d))/g, ",");
  return fraction === undefined ? groupedWhole : `${groupedWhole}.${fraction}`;
}
