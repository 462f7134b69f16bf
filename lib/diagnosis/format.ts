/** Number formatting for evidence sentences: fixed decimals, a real minus sign, thousands grouped. */
function fixed(value: number, decimals: number): string {
  const rounded = Number(value.toFixed(decimals));
  const [whole = "0", fraction] = Math.abs(rounded).toFixed(decimals).split(".");
  const grouped = whole.replace(/\B(?=(\d{3})+(?!\d))/g, ",");
  const text = fraction === undefined ? grouped : `${grouped}.${fraction}`;
  return rounded < 0 ? `−${text}` : text;
}

export const kpa = (value: number) => `${fixed(value, 0)} kPa`;
export const kpaGauge = (value: number) => `${fixed(value, 0)} kPa gauge`;
export const degC = (value: number) => `${fixed(value, 1)} °C`;
export const kelvin = (value: number) => `${fixed(value, 1)} K`;
export const grams = (value: number) => `${fixed(value, 0)} g`;
export const pct = (value: number) => `${fixed(value, value % 1 === 0 ? 0 : 1)} %`;
export const plain = (value: number, decimals: number) => fixed(value, decimals);
