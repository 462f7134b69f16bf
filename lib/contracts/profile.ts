import { z } from "zod";
import { READER_QUANTITIES, UNIT_CHOICES, unitSystems, type ReaderUnits, type UnitChoice } from "@/lib/units";

const choice = <K extends keyof typeof UNIT_CHOICES>(quantity: K) =>
  z
    .enum(UNIT_CHOICES[quantity] as unknown as [ReaderUnits[K], ...ReaderUnits[K][]], {
      error: `Choose one of the ${quantity} units offered.`,
    })
    .nullable();

/** PUT /api/me/profile: null for a quantity means "as my system says"; system null means "as the shop". */
export const profileInputSchema = z.object({
  system: z.enum(unitSystems, { error: "Choose metric or imperial." }).nullable(),
  pressure: choice("pressure"),
  temperature: choice("temperature"),
  mass: choice("mass"),
  volume: choice("volume"),
  vacuum: choice("vacuum"),
  locale: z
    .string()
    .trim()
    .max(35, { error: "A language tag is at most 35 characters, for example en-US." })
    .refine((tag) => tag === "" || isLocale(tag), {
      error: "Not a language tag we know, for example en-US or de-DE.",
    })
    .nullable(),
});
export type ProfileInput = z.infer<typeof profileInputSchema>;

function isLocale(tag: string): boolean {
  try {
    return Intl.getCanonicalLocales(tag).length === 1;
  } catch {
    return false;
  }
}

/** GET and PUT /api/me/profile. */
export interface ProfileResponse {
  /** What the person chose. */
  choice: UnitChoice;
  locale: string | null;
  /** The shop's system, which applies where the person chose nothing. */
  shopSystem: (typeof unitSystems)[number];
  /** The units every field starts in and every number is said in, for this person. */
  units: ReaderUnits;
}

/** The stored choice from the form's input: only what was chosen. */
export function unitChoiceOf(input: ProfileInput): UnitChoice {
  const out: UnitChoice = {};
  if (input.system !== null) out.system = input.system;
  for (const quantity of READER_QUANTITIES) {
    const unit = input[quantity];
    if (unit !== null) (out as Record<string, string>)[quantity] = unit;
  }
  return out;
}
