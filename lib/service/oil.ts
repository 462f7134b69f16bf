import { quantityRangeMarker } from "@/lib/units/quantity";
import { z } from "zod";
import { sayGrams, sayMillilitres } from "./format";
import { SERVICE_SOURCES } from "./sources";

export const REPLACED_PART_IDS = [
  "compressor",
  "condenser",
  "evaporator",
  "accumulator",
  "receiver_drier",
  "hose",
] as const;
export type ReplacedPartId = (typeof REPLACED_PART_IDS)[number];

export const REPLACED_PART_LABELS: Readonly<Record<ReplacedPartId, string>> = {
  compressor: "Compressor",
  condenser: "Condenser",
  evaporator: "Evaporator",
  accumulator: "Accumulator",
  receiver_drier: "Receiver-drier",
  hose: "Hose or line",
};

/**
 * Oil a replaced part takes out of the system with it (mL). `null` means "drain the
 * removed part and measure": a compressor's share varies too much for a fixed figure.
 * common practice, from memory — the vehicle maker's figure governs; shops edit these.
 */
export const DEFAULT_PART_OIL_ALLOWANCES_ML: Readonly<Record<ReplacedPartId, number | null>> = {
  compressor: null,
  condenser: 30,
  evaporator: 60,
  accumulator: 60,
  receiver_drier: 30,
  hose: 10,
};

const allowanceMl = z.number().min(0).max(500).nullable();
/** The shop's edits to the part allowances (mL; null = drain and measure). */
export const partOilAllowancesSchema = z
  .object({
    compressor: allowanceMl,
    condenser: allowanceMl,
    evaporator: allowanceMl,
    accumulator: allowanceMl,
    receiver_drier: allowanceMl,
    hose: allowanceMl,
  })
  .partial()
  .strict();
export type PartOilAllowancesMl = Partial<Record<ReplacedPartId, number | null>>;

export interface ReplacedPart {
  part: ReplacedPartId;
  count?: number;
  /** oil drained from the removed part and measured, when the technician did */
  measuredMl?: number;
}

export interface OilLine {
  label: string;
  volumeMl: number | null;
  source: string;
}

export interface OilAddBack {
  totalMl: number;
  lines: OilLine[];
  /** false while some part still needs its oil drained and measured */
  complete: boolean;
  warnings: string[];
}

function assertVolume(name: string, volumeMl: number): void {
  if (!Number.isFinite(volumeMl) || volumeMl < 0)
    throw new RangeError(`${name} must be a non-negative volume in mL, got ${volumeMl}`);
}

/** A bottle reading under this share of the 4 % estimate is "far less" and earns a warning (from memory). */
export const FAR_LESS_THAN_ESTIMATE_FRACTION = 0.5;

/**
 * Oil to put back: what the recovery machine drained (measured) plus what each replaced part carried.
 * The 4 % estimate from the liquid mass never replaces the measurement (TM 5-3810-307-24-1-2 ch. 9:
 * add back what was drained); when the bottle holds far less than the estimate, it says so, since the
 * machine's separator may have kept some or the compressor may be left short.
 */
export function oilToAddBack(input: {
  drainedDuringRecoveryMl: number;
  replacedParts?: readonly ReplacedPart[];
  allowancesMl?: PartOilAllowancesMl;
  estimatedPulledMl?: number;
  totalSystemOilMl?: number;
}): OilAddBack {
  assertVolume("drainedDuringRecoveryMl", input.drainedDuringRecoveryMl);
  const allowances = { ...DEFAULT_PART_OIL_ALLOWANCES_ML, ...input.allowancesMl };
  const warnings: string[] = [];
  const lines: OilLine[] = [];
  const recoveryMl = input.drainedDuringRecoveryMl;
  if (input.estimatedPulledMl !== undefined) {
    assertVolume("estimatedPulledMl", input.estimatedPulledMl);
    if (input.drainedDuringRecoveryMl < input.estimatedPulledMl * FAR_LESS_THAN_ESTIMATE_FRACTION) {
      warnings.push(
        `Only ${sayMillilitres(input.drainedDuringRecoveryMl)} drained into the recovery machine's bottle, far less than the ${sayMillilitres(
          input.estimatedPulledMl,
        )} the liquid would have carried out: check the machine's oil separator and drain it, then add back what you measure. The record asks for the measured amount.`,
      );
    }
  }
  lines.push({ label: "Drained during recovery", volumeMl: recoveryMl, source: SERVICE_SOURCES.oilAddBack });

  let complete = true;
  for (const { part, count = 1, measuredMl } of input.replacedParts ?? []) {
    if (!Number.isInteger(count) || count < 1)
      throw new RangeError(`count for ${part} must be a positive whole number`);
    const label = `${REPLACED_PART_LABELS[part]}${count > 1 ? ` × ${count}` : ""}`;
    if (measuredMl !== undefined) {
      assertVolume(`measuredMl for ${part}`, measuredMl);
      lines.push({ label: `${label} (drained and measured)`, volumeMl: measuredMl, source: "measured" });
      continue;
    }
    const allowanceMl = allowances[part] ?? null;
    if (allowanceMl === null) {
      complete = false;
      lines.push({
        label: `${label} (drain and measure)`,
        volumeMl: null,
        source: SERVICE_SOURCES.partOilAllowance,
      });
      warnings.push(
        `Drain the removed ${REPLACED_PART_LABELS[part].toLowerCase()} and measure its oil; the total is not final until then.`,
      );
      continue;
    }
    lines.push({ label, volumeMl: allowanceMl * count, source: SERVICE_SOURCES.partOilAllowance });
  }

  const totalMl = lines.reduce((sum, line) => sum + (line.volumeMl ?? 0), 0);
  if (input.totalSystemOilMl !== undefined && totalMl > input.totalSystemOilMl) {
    warnings.push(
      `${sayMillilitres(totalMl)} is more than the system's total oil (${sayMillilitres(input.totalSystemOilMl)}): recheck before adding; too much oil cuts cooling.`,
    );
  }
  return { totalMl, lines, complete, warnings };
}

export type SumpComparison = "less_than_sump" | "about_a_sump" | "more_than_sump";

export interface OilPulledEstimate {
  oilMassG: number;
  oilMl: number;
  sumpComparison: SumpComparison;
  sentence: string;
  sources: string[];
}

export const DEFAULT_OIL_MASS_FRACTION_PCT = 4;
export const DEFAULT_PAG_DENSITY_G_PER_ML = 0.99;
export const DEFAULT_SUMP_ML = { minMl: 60, maxMl: 90 } as const;

/** Oil carried out by liquid refrigerant pulled during a fast recovery. */
export function estimateOilPulledMl(input: {
  liquidRecoveredG: number;
  oilMassFractionPct?: number;
  oilDensityGPerMl?: number;
  sumpMl?: { minMl: number; maxMl: number };
}): OilPulledEstimate {
  const { liquidRecoveredG } = input;
  if (!Number.isFinite(liquidRecoveredG) || liquidRecoveredG < 0) {
    throw new RangeError(`liquidRecoveredG must be a non-negative mass in grams, got ${liquidRecoveredG}`);
  }
  const fractionPct = input.oilMassFractionPct ?? DEFAULT_OIL_MASS_FRACTION_PCT;
  const densityGPerMl = input.oilDensityGPerMl ?? DEFAULT_PAG_DENSITY_G_PER_ML;
  const sump = input.sumpMl ?? DEFAULT_SUMP_ML;
  if (!(fractionPct >= 0 && fractionPct < 100))
    throw new RangeError("oilMassFractionPct must be in [0, 100)");
  if (!(densityGPerMl > 0)) throw new RangeError("oilDensityGPerMl must be positive");
  if (!(sump.minMl > 0 && sump.maxMl >= sump.minMl)) throw new RangeError("sumpMl must be a positive range");

  const oilMassG = (liquidRecoveredG * fractionPct) / 100;
  const oilMl = oilMassG / densityGPerMl;
  const sumpComparison: SumpComparison =
    oilMl < sump.minMl ? "less_than_sump" : oilMl <= sump.maxMl ? "about_a_sump" : "more_than_sump";
  const range = quantityRangeMarker("volume", sump.minMl, sump.maxMl);
  const compared =
    sumpComparison === "less_than_sump"
      ? `less than a compressor sump holds (${range})`
      : sumpComparison === "about_a_sump"
        ? `about what a whole compressor sump holds (${range}): add it back before running the compressor`
        : `more than a compressor sump holds (${range}): check the compressor for oil starvation and measure what drained`;
  const sentence = `About ${sayMillilitres(oilMl)} of oil left with ${sayGrams(liquidRecoveredG)} of liquid — ${compared}.`;
  return {
    oilMassG,
    oilMl,
    sumpComparison,
    sentence,
    sources: [SERVICE_SOURCES.oilCirculation, SERVICE_SOURCES.pagDensity, SERVICE_SOURCES.compressorSump],
  };
}
