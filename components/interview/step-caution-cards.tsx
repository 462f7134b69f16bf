import type { ReactNode } from "react";
import { cautionsById } from "@/lib/cautions/catalog";
import { INTERVIEW_CAUTION_IDS, type InterviewCautionId } from "@/lib/interview/caution-ids";
import type { BarometricSource } from "@/lib/units/barometric";
import { sayInUnits } from "@/lib/units/quantity";
import type { ReaderUnits } from "@/lib/units/reader";
import { cautionCard, FOLD_MARK } from "@/components/cautions/caution-cards";
import type { CautionCardItem } from "@/components/cautions/cautions-fold";

/** Every caution the interview's steps can show, drawn once, in the reader's units. */
export interface StepCautionCards {
  cards: Readonly<Record<InterviewCautionId, CautionCardItem>>;
  foldMark: ReactNode;
}

/**
 * Drawn by the interview's server page and handed to the screen as props, so each step's cautions are
 * on screen from its first paint while the catalogue, its sources and the marks stay out of the
 * phone's script. The screen picks the ones in force (lib/interview/caution-ids.ts).
 */
export function stepCautionCards(units: ReaderUnits, at: BarometricSource): StepCautionCards {
  const cards = Object.fromEntries(
    cautionsById(INTERVIEW_CAUTION_IDS).map((c) => [
      c.id,
      cautionCard(c, false, sayInUnits(c.text, units, at)),
    ]),
  ) as Record<InterviewCautionId, CautionCardItem>;
  return { cards, foldMark: FOLD_MARK };
}
