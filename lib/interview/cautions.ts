import { type Caution, cautionsById } from "@/lib/cautions/catalog";
import type { InterviewAnswers } from "./answers";
import type { ShopSettings } from "./branches";
import { cautionIdsFor } from "./caution-ids";
import type { StepId } from "./steps";

export type { Caution, CautionLevel } from "@/lib/cautions/catalog";

/**
 * The cautions in force, from the one catalogue (lib/cautions/catalog.ts), whose ids the findings
 * engine shares, so a screen showing both can merge them by id. The engine-running caution also
 * depends on the step on screen. Which ones apply is decided in ./caution-ids.ts, which the phone runs
 * without the catalogue.
 */
export function cautionsFor(
  answers: InterviewAnswers,
  options: { shop?: ShopSettings; step?: StepId } = {},
): Caution[] {
  return cautionsById(cautionIdsFor(answers, options));
}
