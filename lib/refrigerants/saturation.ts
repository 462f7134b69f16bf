import { REFRIGERANT_IDS, type RefrigerantId, SATURATION_TABLES, type SaturationTableData } from "./catalog";
import { hermite, monotoneSlopes } from "./monotone-hermite";
import { SaturationRangeError } from "./range-error";

const KELVIN_OFFSET = 273.15;
// Lets the exact end points survive a log/exp round trip.
const EDGE_TOLERANCE = 1e-9;

interface Lookup {
  id: RefrigerantId;
  minTempC: number;
  maxTempC: number;
  stepK: number;
  lastInterval: number;
  inverseTempK: Float64Array;
  lnPressure: Float64Array;
  /** d ln p / d(1/T) at each node */
  forwardSlopes: Float64Array;
  /** d(1/T) / d ln p at each node */
  inverseSlopes: Float64Array;
  /** Even buckets over ln p, each holding the grid interval where it starts, so p → T needs no search. */
  bucketWidth: number;
  bucketInterval: Uint16Array;
}

function buildBuckets(lnPressure: Float64Array): { bucketWidth: number; bucketInterval: Uint16Array } {
  let narrowest = Infinity;
  // The short last step up to the critical point is left out; the forward scan covers it.
  for (let i = 1; i < lnPressure.length - 1; i++)
    narrowest = Math.min(narrowest, lnPressure[i]! - lnPressure[i - 1]!);
  const first = lnPressure[0]!;
  const count = Math.ceil((lnPressure[lnPressure.length - 1]! - first) / narrowest) + 1;
  const bucketWidth = (lnPressure[lnPressure.length - 1]! - first) / (count - 1);
  const bucketInterval = new Uint16Array(count);
  let interval = 0;
  for (let k = 0; k < count; k++) {
    const start = first + k * bucketWidth;
    while (interval < lnPressure.length - 2 && lnPressure[interval + 1]! <= start) interval++;
    bucketInterval[k] = interval;
  }
  return { bucketWidth, bucketInterval };
}

// ln p is nearly linear in 1/T (Clausius–Clapeyron), so a cubic on those axes adds almost no error.
function buildLookup(id: RefrigerantId, table: SaturationTableData): Lookup {
  const count = table.tempC.length;
  const inverseTempK = Float64Array.from(table.tempC, (t) => 1 / (t + KELVIN_OFFSET));
  const lnPressure = Float64Array.from(table.pressureKpaAbs, (p) => Math.log(p));
  return {
    id,
    minTempC: table.minTempC,
    maxTempC: table.maxTempC,
    stepK: table.tempC[1]! - table.tempC[0]!,
    lastInterval: count - 2,
    inverseTempK,
    lnPressure,
    forwardSlopes: monotoneSlopes(inverseTempK, lnPressure),
    inverseSlopes: monotoneSlopes(lnPressure, inverseTempK),
    ...buildBuckets(lnPressure),
  };
}

const LOOKUPS = Object.fromEntries(
  REFRIGERANT_IDS.map((id) => [id, buildLookup(id, SATURATION_TABLES[id])]),
) as Record<RefrigerantId, Lookup>;

function lookupFor(refrigerant: RefrigerantId): Lookup {
  const lookup = LOOKUPS[refrigerant];
  if (!lookup) throw new TypeError(`Unknown refrigerant "${String(refrigerant)}".`);
  return lookup;
}

/** Saturation pressure, kPa absolute. Throws SaturationRangeError outside the table. */
export function saturationPressure(refrigerant: RefrigerantId, tempC: number): number {
  const t = lookupFor(refrigerant);
  if (Number.isNaN(tempC)) throw new RangeError("Temperature is not a number.");
  if (!(tempC >= t.minTempC - EDGE_TOLERANCE)) throw rangeError(t, "temperature", "below", t.minTempC);
  if (!(tempC <= t.maxTempC + EDGE_TOLERANCE)) throw rangeError(t, "temperature", "above", t.maxTempC);
  let i = Math.floor((tempC - t.minTempC) / t.stepK);
  if (i < 0) i = 0;
  else if (i > t.lastInterval) i = t.lastInterval;
  const x = 1 / (tempC + KELVIN_OFFSET);
  const x0 = t.inverseTempK[i]!;
  const lnP = hermite(
    x,
    x0,
    t.inverseTempK[i + 1]! - x0,
    t.lnPressure[i]!,
    t.lnPressure[i + 1]!,
    t.forwardSlopes[i]!,
    t.forwardSlopes[i + 1]!,
  );
  return Math.exp(lnP);
}

/** Saturation temperature, °C, at an absolute pressure in kPa. Throws SaturationRangeError outside the table. */
export function saturationTemperature(refrigerant: RefrigerantId, pressureKpaAbs: number): number {
  const t = lookupFor(refrigerant);
  if (Number.isNaN(pressureKpaAbs)) throw new RangeError("Pressure is not a number.");
  const lnP = pressureKpaAbs > 0 ? Math.log(pressureKpaAbs) : -Infinity;
  const ys = t.lnPressure;
  const last = t.lastInterval + 1;
  if (!(lnP >= ys[0]! - EDGE_TOLERANCE)) throw rangeError(t, "pressure", "below", Math.exp(ys[0]!));
  if (!(lnP <= ys[last]! + EDGE_TOLERANCE)) throw rangeError(t, "pressure", "above", Math.exp(ys[last]!));
  const bucket = Math.floor((lnP - ys[0]!) / t.bucketWidth);
  let low =
    t.bucketInterval[
      bucket < 0 ? 0 : bucket >= t.bucketInterval.length ? t.bucketInterval.length - 1 : bucket
    ]!;
  while (low < last - 1 && ys[low + 1]! <= lnP) low++;
  const y0 = ys[low]!;
  const x = hermite(
    lnP,
    y0,
    ys[low + 1]! - y0,
    t.inverseTempK[low]!,
    t.inverseTempK[low + 1]!,
    t.inverseSlopes[low]!,
    t.inverseSlopes[low + 1]!,
  );
  const tempC = 1 / x - KELVIN_OFFSET;
  return tempC > t.maxTempC ? t.maxTempC : tempC < t.minTempC ? t.minTempC : tempC;
}

function rangeError(
  t: Lookup,
  quantity: "temperature" | "pressure",
  limit: "below" | "above",
  limitValue: number,
) {
  return new SaturationRangeError({ refrigerant: t.id, quantity, limit, limitValue, minTempC: t.minTempC });
}
