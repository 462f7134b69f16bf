import { z } from "zod";
import { REFRIGERANT_IDS, type RefrigerantId } from "@/lib/refrigerants";
import { REPLACED_PART_IDS, partOilAllowancesSchema } from "./oil";

const massG = z.number().min(0).max(20_000);
const volumeMl = z.number().min(0).max(2_000);
const pressureKpaAbs = z.number().min(0).max(150);
const refrigerantIds = REFRIGERANT_IDS as readonly [RefrigerantId, ...RefrigerantId[]];

/**
 * A case's service record as entered step by step: every step is optional until done.
 * Internal units only (g, mL, kPa absolute, minutes); the screens convert at the edges.
 */
export const serviceRecordSchema = z.object({
  identifier: z
    .object({
      purityPct: z.number().min(0).max(100),
      airPct: z.number().min(0).max(100).optional(),
    })
    .optional(),
  recovery: z
    .object({
      startedAt: z.iso.datetime({ offset: true }).optional(),
      endedAt: z.iso.datetime({ offset: true }).optional(),
      recoveredG: massG,
      oilDrainedMl: volumeMl,
      cylinderId: z.string().min(1).optional(),
      /** the technician saw oil come out with liquid during a fast recovery */
      oilPulledWithLiquid: z.boolean().optional(),
      /** liquid mass pulled in that phase; defaults to everything recovered */
      liquidRecoveredG: massG.optional(),
    })
    .optional(),
  evacuation: z
    .object({
      deepestKpaAbs: pressureKpaAbs,
      hold: z
        .object({ startKpaAbs: pressureKpaAbs, endKpaAbs: pressureKpaAbs, minutes: z.number().positive().max(240) })
        .optional(),
    })
    .optional(),
  oil: z
    .object({
      type: z.string().trim().min(1).max(60),
      addedMl: volumeMl,
      replacedParts: z
        .array(z.object({ part: z.enum(REPLACED_PART_IDS), count: z.number().int().min(1).max(10).optional(), measuredMl: volumeMl.optional() }))
        .max(20)
        .optional(),
    })
    .optional(),
  recharge: z
    .object({
      targetG: massG.positive(),
      chargedG: massG,
      cylinderId: z.string().min(1).optional(),
    })
    .optional(),
});
export type ServiceRecordInput = z.infer<typeof serviceRecordSchema>;

/** What the record is judged against: the vehicle, the shop's settings and the conditions. */
export const serviceContextSchema = z.object({
  refrigerant: z.enum(refrigerantIds),
  labelChargeG: massG.positive().optional(),
  specChargeG: massG.positive().optional(),
  revisedChargeG: massG.positive().optional(),
  expansionDevice: z.enum(["orifice_tube", "txv"]).optional(),
  electricCompressor: z.boolean().optional(),
  specOilType: z.string().optional(),
  totalSystemOilMl: volumeMl.optional(),
  altitudeM: z.number().min(-500).max(5000).optional(),
  barometricKpa: z.number().min(50).max(110).optional(),
  ambientC: z.number().min(0).max(60).optional(),
  holdLimit: z.object({ riseKpa: z.number().min(0).max(50), perMinutes: z.number().positive().max(60) }).optional(),
  recoveryShortfallPct: z.number().min(0).max(50).optional(),
  chargeToleranceG: z.number().min(0).max(100).optional(),
  partOilAllowancesMl: partOilAllowancesSchema.optional(),
});
export type ServiceContext = z.infer<typeof serviceContextSchema>;
