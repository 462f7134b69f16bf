import { saturationTemperature, type RefrigerantId } from "@/lib/refrigerants";
import { staticCheck, subcoolingK, superheatK } from "@/lib/refrigerants/derived";
import { expectedBands } from "@/lib/refrigerants/expected-bands";
import { absoluteToGaugeKpa, gaugeToAbsoluteKpa } from "@/lib/units";
import { STATIC_EXCESS_KPA, SUBCOOLING_K, SUPERHEAT_K } from "@/lib/diagnosis/grading";
import { recoveredAgainstLabel } from "@/lib/service/charge";

export type BandStatus = "inside" | "below" | "above" | "unknown";
export interface ReadoutLine {
  text: string;
  status?: BandStatus;
  /** Replaces the plain "in range / above range" word when the reading needs its own. */
  verdict?: string;
}

export interface PhysicsContext {
  refrigerant?: RefrigerantId;
  expansionDevice?: "orifice_tube" | "txv";
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

function band(value: number, min: number, max: number): BandStatus {
  return value < min ? "below" : value > max ? "above" : "inside";
}

/** The physics shown beside each reading as it is typed. Pure: recomputed on every keystroke. */
export function liveReadouts(
  group: string,
  values: Record<string, unknown>,
  ctx: PhysicsContext,
): Record<string, ReadoutLine[]> {
  const { refrigerant, ambientC } = ctx;
  const at = { altitudeM: ctx.altitudeM };
  const out: Record<string, ReadoutLine[]> = {};
  if (!refrigerant) return out;

  if (group === "static" && num(values.staticKpaGauge) && num(ambientC)) {
    const staticKpaGauge = values.staticKpaGauge;
    out.staticKpaGauge = safely(() => {
      const check = staticCheck({
        refrigerant,
        staticKpaAbs: gaugeToAbsoluteKpa(staticKpaGauge, at),
        ambientC,
      });
      if (check.kind === "out_of_range") return [{ text: check.message, status: "unknown" }];
      const satGauge = absoluteToGaugeKpa(check.saturationKpaAbs, at);
      const lines: ReadoutLine[] = [
        { text: `Saturation at ${fmt(ambientC)} °C ambient: ${fmt(satGauge, 0)} kPa gauge` },
      ];
      if (check.kind === "no_liquid") lines.push({ text: check.message, status: "below", verdict: "" });
      // The same tolerance the findings engine grades against, so the screen and the findings agree.
      else {
        const air = check.excessKpa > STATIC_EXCESS_KPA.slight;
        lines.push({
          text: `Static pressure is ${fmt(Math.abs(check.excessKpa), 0)} kPa ${check.excessKpa >= 0 ? "above" : "below"} saturation`,
          status: air ? "above" : "inside",
          verdict: air ? "air or another gas is likely present" : "no sign of air",
        });
      }
      return lines;
    });
  }

  if (group === "running") {
    const bands = num(ambientC) ? expectedBandsOrNull(refrigerant, ambientC, ctx.relativeHumidityPct) : null;
    if (num(values.highKpaGauge)) {
      const high = values.highKpaGauge;
      out.highKpaGauge = safely(() => {
        const condensingC = saturationTemperature(refrigerant, gaugeToAbsoluteKpa(high, at));
        const lines: ReadoutLine[] = [
          {
            text: `Condensing at ${fmt(condensingC)} °C${num(ambientC) ? `, ${fmt(condensingC - ambientC)} K above the air` : ""}`,
          },
        ];
        if (bands) {
          const min = absoluteToGaugeKpa(bands.high.minKpaAbs, at);
          const max = absoluteToGaugeKpa(bands.high.maxKpaAbs, at);
          lines.push({
            text: `Expected ${fmt(min, 0)}–${fmt(max, 0)} kPa gauge for this air temperature`,
            status: band(high, min, max),
          });
        }
        return lines;
      });
    }
    if (num(values.lowKpaGauge)) {
      const low = values.lowKpaGauge;
      out.lowKpaGauge = safely(() => {
        const evaporatingC = saturationTemperature(refrigerant, gaugeToAbsoluteKpa(low, at));
        const lines: ReadoutLine[] = [{ text: `Evaporating at ${fmt(evaporatingC)} °C` }];
        if (bands) {
          const min = absoluteToGaugeKpa(bands.low.minKpaAbs, at);
          const max = absoluteToGaugeKpa(bands.low.maxKpaAbs, at);
          lines.push({
            text: `Expected ${fmt(min, 0)}–${fmt(max, 0)} kPa gauge`,
            status: band(low, min, max),
          });
        }
        return lines;
      });
    }
    if (num(values.highKpaGauge) && num(values.liquidLineC)) {
      const highKpaAbs = gaugeToAbsoluteKpa(values.highKpaGauge, at);
      const liquidLineC = values.liquidLineC;
      out.liquidLineC = safely(() => {
        const sc = subcoolingK({ refrigerant, highKpaAbs, liquidLineC });
        // The findings engine's typical range for a TXV system (lib/diagnosis/grading.ts).
        const { low, high } = SUBCOOLING_K.txv;
        const typical =
          ctx.expansionDevice === "txv"
            ? { text: ` (typical for a TXV system ${low}–${high} K)`, status: band(sc, low, high) }
            : { text: "", status: undefined };
        return [{ text: `Subcooling ${fmt(sc)} K${typical.text}`, status: typical.status }];
      });
    }
    if (num(values.lowKpaGauge) && num(values.suctionLineC)) {
      const lowKpaAbs = gaugeToAbsoluteKpa(values.lowKpaGauge, at);
      const suctionLineC = values.suctionLineC;
      out.suctionLineC = safely(() => {
        const sh = superheatK({ refrigerant, lowKpaAbs, suctionLineC });
        const { nearZero, high } = SUPERHEAT_K.txv;
        const typical =
          ctx.expansionDevice === "txv"
            ? { text: ` (typical for a TXV system ${nearZero}–${high} K)`, status: band(sh, nearZero, high) }
            : { text: " (an orifice-tube evaporator runs near 0 K)", status: undefined };
        return [{ text: `Superheat ${fmt(sh)} K${typical.text}`, status: typical.status }];
      });
    }
    if (num(values.ventC) && num(ambientC)) {
      out.ventC = [{ text: `${fmt(ambientC - values.ventC)} K below the air temperature` }];
    }
  }

  if (group === "chargeAudit" && num(values.recoveredChargeG) && num(ctx.labelChargeG)) {
    const labelChargeG = ctx.labelChargeG;
    const recoveredChargeG = values.recoveredChargeG;
    out.recoveredChargeG = safely(() => {
      // The service record's verdict (SAE J2788/J2843 recovery allowance), so both screens agree.
      const { deltaG, deltaPct, verdict } = recoveredAgainstLabel({
        labelChargeG,
        recoveredChargeG,
        refrigerant,
      });
      const status: BandStatus = verdict === "over" ? "above" : verdict === "under" ? "below" : "inside";
      return [
        {
          text: `${deltaG >= 0 ? "+" : "−"}${fmt(Math.abs(deltaG), 0)} g (${deltaPct >= 0 ? "+" : "−"}${fmt(Math.abs(deltaPct))} %) against the ${fmt(labelChargeG, 0)} g label`,
          status,
        },
      ];
    });
  }
  return out;
}

function expectedBandsOrNull(refrigerant: RefrigerantId, ambientC: number, relativeHumidityPct?: number) {
  try {
    return expectedBands({ refrigerant, ambientC, relativeHumidityPct });
  } catch {
    return null;
  }
}
