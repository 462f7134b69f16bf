import { STATIC_CHECK, SUBCOOLING_K, SUPERHEAT_K } from "@/lib/diagnosis/grading";
import type { RefrigerantId } from "@/lib/refrigerants/catalog";
import { staticCheck } from "@/lib/refrigerants/derived";
import { expectedBands } from "@/lib/refrigerants/expected-bands";
import { runningPhysics, type RunningPhysics } from "@/lib/refrigerants/readings";
import { saturationTemperature } from "@/lib/refrigerants/saturation";
import { chargeDeviationVerdict, chargeVerdictOf } from "@/lib/service/charge-verdict";
import type { ExpansionDevice } from "@/lib/vehicles/expansion-devices";
import { quantityMarker as q, quantityRangeMarker as range } from "@/lib/units/quantity";

/*
 * The physics shown beside each reading as it is typed: pure, recomputed on every keystroke. The numbers
 * come from the same functions the findings engine uses (runningPhysics, staticCheck, expectedBands) and
 * are judged against the engine's own grading table, so the screen and the findings agree. Numbers go
 * into the text as quantity markers (lib/units/quantity.ts): the screen says them in the reader's units.
 */

const tempC = (value: number) => q({ kind: "temperature", value: round1(value), decimals: 1 });
const kelvin = (value: number, decimals: 0 | 1 = 1) =>
  q({ kind: "temperature_difference", value: round1(value), decimals });
const round1 = (value: number) => Math.round(value * 1000) / 1000;

export type BandStatus = "inside" | "below" | "above" | "unknown";
export interface ReadoutLine {
  /** With quantity markers: a screen says it with sayInUnits (lib/units) in the reader's units. */
  text: string;
  status?: BandStatus;
  /** Replaces the plain "in range / above range" word when the reading needs its own. */
  verdict?: string;
}

export interface PhysicsContext {
  refrigerant?: RefrigerantId;
  expansionDevice?: ExpansionDevice;
  ambientC?: number;
  relativeHumidityPct?: number;
  altitudeM?: number;
  labelChargeG?: number;
}

const fmt = (value: number, decimals = 1) =>
  (Math.round(value * 10 ** decimals) / 10 ** decimals).toFixed(decimals);
const num = (v: unknown): v is number => typeof v === "number" && Number.isFinite(v);

function safely(fn: () => ReadoutLine[]): ReadoutLine[] {
  try {
    return fn();
  } catch (error) {
    return error instanceof RangeError ? [{ text: error.message, status: "unknown" }] : [];
  }
}

/** Why a pressure has no saturation temperature: the tables' own message (reached only off the table). */
function offTable(refrigerant: RefrigerantId, kpaAbs: number): ReadoutLine[] {
  return safely(() => {
    saturationTemperature(refrigerant, kpaAbs);
    return [];
  });
}

function band(value: number, min: number, max: number): BandStatus {
  return value < min ? "below" : value > max ? "above" : "inside";
}

function expectedBandsOrNull(refrigerant: RefrigerantId, ambientC: number, relativeHumidityPct?: number) {
  try {
    return expectedBands({ refrigerant, ambientC, relativeHumidityPct });
  } catch {
    return null;
  }
}

function staticLines(
  refrigerant: RefrigerantId,
  staticKpaGauge: number,
  referenceC: number,
  where: string,
  barometricKpa: number,
) {
  return safely(() => {
    const staticKpaAbs = staticKpaGauge + barometricKpa;
    const check = staticCheck({ refrigerant, staticKpaAbs, ambientC: referenceC });
    if (check.kind === "out_of_range") return [{ text: check.message, status: "unknown" }];
    const satGauge = check.saturationKpaAbs - barometricKpa;
    const lines: ReadoutLine[] = [
      {
        text: `Saturation at ${tempC(referenceC)} ${where}: ${q({ kind: "pressure_gauge", value: satGauge })}`,
      },
    ];
    if (check.kind === "no_liquid") lines.push({ text: check.message, status: "below", verdict: "" });
    // The same tolerance in kelvin the findings engine grades against, so the screen and the findings agree.
    else {
      const excessK = saturationTemperature(refrigerant, staticKpaAbs) - referenceC;
      const air = excessK > STATIC_CHECK.normalUpToK;
      lines.push({
        text: `Static pressure is ${kelvin(Math.abs(excessK))} ${excessK >= 0 ? "above" : "below"} saturation`,
        status: air ? "above" : "inside",
        verdict: air ? "air or another gas is likely present" : "no sign of air",
      });
    }
    return lines;
  });
}

function runningLines(
  values: Record<string, unknown>,
  ctx: PhysicsContext & { refrigerant: RefrigerantId },
  physics: RunningPhysics,
): Record<string, ReadoutLine[]> {
  const { refrigerant, ambientC } = ctx;
  const out: Record<string, ReadoutLine[]> = {};
  const gauge = (kpaAbs: number) => kpaAbs - physics.barometricKpa;
  const bands = num(ambientC) ? expectedBandsOrNull(refrigerant, ambientC, ctx.relativeHumidityPct) : null;
  const { highKpaAbs, lowKpaAbs, condensingC, evaporatingC, subcoolingK, superheatK } = physics;

  if (num(values.highKpaGauge) && highKpaAbs !== undefined) {
    const high = values.highKpaGauge;
    if (condensingC === undefined) out.highKpaGauge = offTable(refrigerant, highKpaAbs);
    else {
      const lines: ReadoutLine[] = [
        {
          text: `Condensing at ${tempC(condensingC)}${num(ambientC) ? `, ${kelvin(condensingC - ambientC)} above the air` : ""}`,
        },
      ];
      if (bands) {
        const [min, max] = [gauge(bands.high.minKpaAbs), gauge(bands.high.maxKpaAbs)];
        lines.push({
          text: `Expected ${range("pressure_gauge", min, max)} for this air temperature`,
          status: band(high, min, max),
        });
      }
      out.highKpaGauge = lines;
    }
  }
  if (num(values.lowKpaGauge) && lowKpaAbs !== undefined) {
    const low = values.lowKpaGauge;
    if (evaporatingC === undefined) out.lowKpaGauge = offTable(refrigerant, lowKpaAbs);
    else {
      const lines: ReadoutLine[] = [{ text: `Evaporating at ${tempC(evaporatingC)}` }];
      if (bands) {
        const [min, max] = [gauge(bands.low.minKpaAbs), gauge(bands.low.maxKpaAbs)];
        lines.push({ text: `Expected ${range("pressure_gauge", min, max)}`, status: band(low, min, max) });
      }
      out.lowKpaGauge = lines;
    }
  }
  if (num(values.liquidLineC) && highKpaAbs !== undefined) {
    if (subcoolingK === undefined) out.liquidLineC = offTable(refrigerant, highKpaAbs);
    else {
      // The findings engine's typical range for a TXV system (lib/diagnosis/grading.ts).
      const { low, high } = SUBCOOLING_K.txv;
      const typical =
        ctx.expansionDevice === "txv"
          ? {
              text: ` (typical for a TXV system ${range("temperature_difference", low, high, 0)})`,
              status: band(subcoolingK, low, high),
            }
          : { text: "", status: undefined };
      out.liquidLineC = [
        { text: `Subcooling ${kelvin(subcoolingK)}${typical.text}`, status: typical.status },
      ];
    }
  }
  if (num(values.suctionLineC) && lowKpaAbs !== undefined) {
    if (superheatK === undefined) out.suctionLineC = offTable(refrigerant, lowKpaAbs);
    else {
      const { nearZero, high } = SUPERHEAT_K.txv;
      const typical =
        ctx.expansionDevice === "txv"
          ? {
              text: ` (typical for a TXV system ${range("temperature_difference", nearZero, high, 0)})`,
              status: band(superheatK, nearZero, high),
            }
          : { text: ` (an orifice-tube evaporator runs near ${kelvin(0, 0)})`, status: undefined };
      out.suctionLineC = [{ text: `Superheat ${kelvin(superheatK)}${typical.text}`, status: typical.status }];
    }
  }
  if (num(values.ventC) && num(ambientC)) {
    out.ventC = [{ text: `${kelvin(ambientC - values.ventC)} below the air temperature` }];
  }
  return out;
}

function chargeLines(refrigerant: RefrigerantId, labelChargeG: number, recoveredChargeG: number) {
  return safely(() => {
    // The service record's verdict (SAE J2788/J2843 recovery allowance), so both screens agree.
    const { deltaG, deltaPct, grade } = chargeDeviationVerdict({
      labelChargeG,
      recoveredChargeG,
      refrigerant,
    });
    const verdict = chargeVerdictOf(grade);
    const status: BandStatus = verdict === "over" ? "above" : verdict === "under" ? "below" : "inside";
    return [
      {
        text: `${deltaG >= 0 ? "+" : "−"}${q({ kind: "mass", value: Math.abs(deltaG) })} (${deltaPct >= 0 ? "+" : "−"}${fmt(Math.abs(deltaPct))} %) against the ${q({ kind: "mass", value: labelChargeG })} label`,
        status,
      },
    ];
  });
}

/** The readout lines for each field of the group on screen, keyed by field name. */
export function liveReadouts(
  group: string,
  values: Record<string, unknown>,
  ctx: PhysicsContext,
): Record<string, ReadoutLine[]> {
  const { refrigerant, ambientC } = ctx;
  if (!refrigerant) return {};
  let physics: RunningPhysics;
  try {
    physics = runningPhysics({
      refrigerant,
      altitudeM: ctx.altitudeM,
      ambientC,
      highKpaGauge: num(values.highKpaGauge) ? values.highKpaGauge : undefined,
      lowKpaGauge: num(values.lowKpaGauge) ? values.lowKpaGauge : undefined,
      liquidLineC: num(values.liquidLineC) ? values.liquidLineC : undefined,
      suctionLineC: num(values.suctionLineC) ? values.suctionLineC : undefined,
    });
  } catch {
    // An altitude outside the standard atmosphere: the conditions step says so; nothing to compute here.
    return {};
  }

  if (group === "static" && num(values.staticKpaGauge) && num(ambientC)) {
    // Judged at the parts' soak temperature when it is given, as the findings engine judges it.
    const soaked = num(values.staticSoakC);
    const referenceC = soaked ? (values.staticSoakC as number) : ambientC;
    const where = soaked ? "the parts' soak temperature" : "ambient";
    return {
      staticKpaGauge: staticLines(
        refrigerant,
        values.staticKpaGauge,
        referenceC,
        where,
        physics.barometricKpa,
      ),
    };
  }
  if (group === "running") return runningLines(values, { ...ctx, refrigerant }, physics);
  if (group === "chargeAudit" && num(values.recoveredChargeG) && num(ctx.labelChargeG))
    return { recoveredChargeG: chargeLines(refrigerant, ctx.labelChargeG, values.recoveredChargeG) };
  return {};
}
