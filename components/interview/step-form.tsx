"use client";

import { forwardRef, useImperativeHandle, useMemo } from "react";
import type { InterviewAnswers } from "@/lib/interview/answers";
import type { GroupId } from "@/lib/interview/steps";
import type { AnswerIssue } from "@/lib/interview/validate";
import type { ShopSettings } from "@/lib/interview/branches";
import { GroupForm } from "./group-form";
import { fieldsFor } from "./group-fields";
import { liveReadouts, type PhysicsContext, type ReadoutLine } from "@/lib/interview/readouts";
import { sayInUnits } from "@/lib/units";
import { answerValuesOf, formValuesOf } from "./form-values";
import { equivalents } from "./quantities";
import { useGroupForm, type ValuesMode } from "./use-group-form";
import { unitsForField, type QuantityKind, type UnitPreferences } from "./unit-preferences";

export interface StepFormHandle {
  /** Validates the group; returns its values, or null after focusing the first problem. */
  check: () => Promise<Record<string, unknown> | null>;
  /** Fills fields from internal values (a spec-table row, say), as if the technician had typed them. */
  apply: (values: Record<string, unknown>) => void;
}

interface Props {
  group: GroupId;
  saved: unknown;
  answers: InterviewAnswers;
  issues?: AnswerIssue[];
  /** The person's units (their profile); a field's own unit button overrides them for that field. */
  units: UnitPreferences;
  locale?: string;
  physics: PhysicsContext;
  shop: ShopSettings;
  onValues: (values: Record<string, unknown>, mode: ValuesMode) => void;
}

const STATUS_TEXT = { inside: "in range", below: "below range", above: "above range", unknown: "" } as const;

function Readout({
  lines,
  conversion,
  units,
}: {
  lines: ReadoutLine[];
  conversion?: string;
  units: UnitPreferences;
}) {
  return (
    <div className="space-y-0.5 font-mono text-base">
      {conversion && <p className="text-ink-soft">= {conversion}</p>}
      {lines.map((line, i) => (
        <p
          key={i}
          className={
            line.status === "above" || line.status === "below"
              ? "font-bold text-ember-700"
              : line.status === "inside"
                ? "text-sound-700"
                : "text-ink"
          }
        >
          {sayInUnits(line.text, units)}
          {line.verdict !== undefined
            ? line.verdict
              ? ` — ${line.verdict}`
              : ""
            : line.status && STATUS_TEXT[line.status]
              ? ` — ${STATUS_TEXT[line.status]}`
              : ""}
        </p>
      ))}
    </div>
  );
}

export const StepForm = forwardRef<StepFormHandle, Props>(function StepForm(
  { group, saved, answers, issues, units, locale, physics, shop, onValues },
  ref,
) {
  const compressorType = answers.system?.compressorType;
  // eslint-disable-next-line react-hooks/exhaustive-deps -- only the compressor type decides which fields show
  const fields = useMemo(() => fieldsFor(group, answers), [group, compressorType]);
  const { control, values, errors, reading, setFieldUnit, commit } = useGroupForm({
    group,
    fields,
    saved,
    otherAnswers: answers,
    units,
    locale,
    shop,
    onValues,
  });

  useImperativeHandle(ref, () => ({
    check: async () => {
      const problems = control.trigger();
      if (Object.keys(problems).length > 0) {
        const first = fields.find((f) => problems[f.name] !== undefined);
        if (first) control.setFocus(first.name);
        return null;
      }
      return answerValuesOf(fields, control.getValues(), reading);
    },
    apply: (picked) => {
      const shown = formValuesOf(fields, picked, reading);
      for (const [name, value] of Object.entries(shown)) {
        if (picked[name] !== undefined) control.setValue(name, value);
      }
      commit();
    },
  }));

  const internal = useMemo(() => answerValuesOf(fields, values, reading), [fields, values, reading]);
  const physicsLines = useMemo(() => liveReadouts(group, internal, physics), [group, internal, physics]);
  const readouts: Record<string, React.ReactNode> = {};
  const readoutKeys: Record<string, string> = {};
  for (const def of fields) {
    const value = internal[def.name];
    const kind = def.kind as QuantityKind;
    const quantity = kind === "pressure" || kind === "temperature" || kind === "mass" || kind === "volume";
    const fieldUnits = unitsForField(reading.units, reading.fieldUnits ?? {}, def.name, def.kind);
    const conversion =
      quantity && typeof value === "number" ? equivalents(kind, value, fieldUnits[kind]) : undefined;
    const lines = physicsLines[def.name] ?? [];
    if (conversion || lines.length) {
      readouts[def.name] = <Readout conversion={conversion} lines={lines} units={units} />;
      // The person's units are in the field's reading too: a change there re-renders the field anyway.
      readoutKeys[def.name] = JSON.stringify([conversion, lines]);
    }
  }

  return (
    <GroupForm
      control={control}
      values={values}
      errors={errors}
      fields={fields}
      reading={reading}
      setFieldUnit={setFieldUnit}
      commit={commit}
      readouts={readouts}
      readoutKeys={readoutKeys}
      serverIssues={issues}
    />
  );
});
