import type { GroupId } from "@/lib/interview/steps";
import type { QuantityKind } from "./unit-preferences";

export interface ChoiceOption {
  value: string;
  label: string;
}

export type FieldDef =
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
  | { name: string; label: string; kind: "multi"; options: readonly ChoiceOption[]; hint?: string };

export type FormValues = Record<string, string | string[]>;

export type GroupFields = Record<GroupId, FieldDef[]>;
