import type { GroupId } from "@/lib/interview/steps";
import type { QuantityKind } from "./unit-preferences";

export interface ChoiceOption {
  value: string;
  label: string;
}

import type { InterviewAnswers } from "@/lib/interview/answers";

/** Asked only when the answers so far make it apply (the clutch points on a cycling clutch). */
type When = { showWhen?: (answers: InterviewAnswers) => boolean };

export type FieldDef = When &
  (
    | { name: string; label: string; kind: QuantityKind; hint?: string }
    | { name: string; label: string; kind: "plain"; unit: string; hint?: string; placeholder?: string }
    | { name: string; label: string; kind: "text"; multiline?: boolean; hint?: string }
    | {
        name: string;
        label: string;
        kind: "choice";
        options: readonly ChoiceOption[];
        optional?: boolean;
        hint?: string;
      }
    | { name: string; label: string; kind: "yesno"; hint?: string }
    | { name: string; label: string; kind: "multi"; options: readonly ChoiceOption[]; hint?: string }
  );

export type FormValues = Record<string, string | string[]>;

export type GroupFields = Record<GroupId, FieldDef[]>;
