import { ventingBanApplies } from "@/lib/cautions/by-refrigerant";
import { CAUTIONS, type Caution, type CautionId } from "@/lib/cautions/catalog";
import type { RefrigerantId } from "@/lib/refrigerants/catalog";
import type { ExpansionDevice } from "@/lib/vehicles/expansion-devices";

export type ServiceStep = "identify" | "recovery" | "oil" | "evacuation" | "recharge";

export interface CautionContext {
  step?: ServiceStep;
  refrigerant?: RefrigerantId;
  expansionDevice?: ExpansionDevice;
  electricCompressor?: boolean;
}

/** A catalogue caution with the service steps it is shown at (empty: every step) and when it applies. */
export interface ServiceCaution extends Caution {
  steps: readonly ServiceStep[];
}

interface Rule {
  id: CautionId;
  steps: readonly ServiceStep[];
  /** absent: always. An unknown refrigerant or device keeps its cautions on screen (better once too often than missed). */
  when?: (ctx: CautionContext) => boolean;
}

const electric = (ctx: CautionContext) => ctx.electricCompressor === true;

/** Which catalogue cautions the service record shows, and when; in display order, the deferral last. */
const RULES: readonly Rule[] = [
  { id: "eye_and_skin", steps: [] },
  { id: "identify_before_recovery", steps: ["identify", "recovery"] },
  {
    id: "recover_slowly_accumulator",
    steps: ["recovery"],
    when: (ctx) => ctx.expansionDevice === undefined || ctx.expansionDevice === "orifice_tube",
  },
  { id: "recover_again_after_rise", steps: ["recovery"] },
  {
    id: "never_vent",
    steps: ["recovery", "evacuation", "recharge"],
    when: (ctx) => ventingBanApplies(ctx.refrigerant),
  },
  {
    id: "r744_pressure",
    steps: [],
    when: (ctx) => ctx.refrigerant === undefined || ctx.refrigerant === "R-744",
  },
  {
    id: "flammable_r1234yf",
    steps: ["recovery", "evacuation", "recharge"],
    when: (ctx) => ctx.refrigerant === undefined || ctx.refrigerant === "R-1234yf",
  },
  { id: "high_voltage_compressor", steps: [], when: electric },
  { id: "dielectric_oil", steps: ["recovery", "oil", "recharge"], when: electric },
  { id: "recovery_cylinder_fill", steps: ["recovery"] },
  { id: "leak_test_gas", steps: ["evacuation"] },
  { id: "charge_by_weight", steps: ["recharge"] },
  { id: "repair_before_refill", steps: ["recharge"] },
  { id: "defer_to_procedure", steps: [] },
];

/** Every caution the service record can show, in display order; the deferral to local rules is last. */
export const SERVICE_CAUTIONS: readonly ServiceCaution[] = RULES.map((r) => ({
  ...CAUTIONS[r.id],
  steps: r.steps,
}));

/** The cautions for a step (or the whole job), in display order, ending with the local-rules line. */
export function cautionsFor(ctx: CautionContext = {}): ServiceCaution[] {
  return RULES.flatMap((rule, i) => {
    if (ctx.step && rule.steps.length > 0 && !rule.steps.includes(ctx.step)) return [];
    if (rule.when && !rule.when(ctx)) return [];
    return [SERVICE_CAUTIONS[i]!];
  });
}
