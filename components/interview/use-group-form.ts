"use client";

import { useCallback, useEffect, useMemo, useRef, useState } from "react";
import { useForm, type FieldErrors, type Resolver } from "react-hook-form";
import { sayInUnits } from "@/lib/units";
import type { InterviewAnswers } from "@/lib/interview/answers";
import type { GroupId } from "@/lib/interview/steps";
import { validateGroup } from "@/lib/interview/validate";
import type { ShopSettings } from "@/lib/interview/branches";
import type { FieldDef, FormValues } from "./field-defs";
import { answerValuesOf, formValuesOf, unreadableFields, type Reading } from "./form-values";
import type { FieldUnits, UnitPreferences } from "./unit-preferences";

/** typing: kept as the draft only. commit: becomes the answer if it is valid. */
export type ValuesMode = "typing" | "commit";

/**
 * A value left alone this long is taken as meant (common practice for autosave; longer than the pause
 * between two keys of one reading, so "9" on the way to "95" is never taken).
 */
export const COMMIT_PAUSE_MS = 2500;

/**
 * One question group as a react-hook-form form. Values are the text typed, in each field's unit;
 * validation reads them by the person's locale, converts them and runs the same zod schemas the
 * server uses. Every change goes to the interview machine as a draft at once, so nothing typed is
 * lost; it becomes the answer only on leaving the field, on Next, or after a pause.
 */
export function useGroupForm({
  group,
  fields,
  saved,
  otherAnswers,
  units,
  locale,
  shop,
  onValues,
}: {
  group: GroupId;
  fields: FieldDef[];
  saved: unknown;
  otherAnswers: InterviewAnswers;
  units: UnitPreferences;
  locale?: string;
  shop: ShopSettings;
  onValues: (values: Record<string, unknown>, mode: ValuesMode) => void;
}) {
  const [fieldUnits, setFieldUnits] = useState<FieldUnits>({});
  const reading: Reading = useMemo(() => ({ units, fieldUnits, locale }), [units, fieldUnits, locale]);
  const latest = useRef({ otherAnswers, reading, shop, onValues });
  useEffect(() => {
    latest.current = { otherAnswers, reading, shop, onValues };
  }, [otherAnswers, reading, shop, onValues]);

  const resolver = useMemo<Resolver<FormValues>>(
    () => async (values) => {
      const { otherAnswers: others, reading: r, shop: s } = latest.current;
      const errors: FieldErrors<FormValues> = {};
      for (const { field, problem } of unreadableFields(fields, values, r))
        errors[field] = { type: "validate", message: problem.message };
      if (Object.keys(errors).length > 0) return { values: {}, errors };
      const check = validateGroup(group, answerValuesOf(fields, values, r), others, s);
      if (check.ok) return { values, errors: {} };
      for (const issue of check.issues) {
        const key = fields.some((f) => f.name === issue.field) ? issue.field : (fields[0]?.name ?? "root");
        errors[key] ??= { type: "validate", message: sayInUnits(issue.message, r.units) };
      }
      return { values: {}, errors };
    },
    [group, fields],
  );

  const form = useForm<FormValues>({
    defaultValues: formValuesOf(fields, saved, { units, locale }),
    resolver,
    mode: "onTouched",
  });
  const { subscribe, getValues } = form;

  const pause = useRef<ReturnType<typeof setTimeout> | undefined>(undefined);
  const commit = useCallback(() => {
    clearTimeout(pause.current);
    latest.current.onValues(answerValuesOf(fields, getValues(), latest.current.reading), "commit");
  }, [fields, getValues]);
  useEffect(() => () => clearTimeout(pause.current), []);

  useEffect(
    () =>
      subscribe({
        formState: { values: true },
        callback: ({ values }) => {
          latest.current.onValues(
            answerValuesOf(fields, values as FormValues, latest.current.reading),
            "typing",
          );
          clearTimeout(pause.current);
          pause.current = setTimeout(commit, COMMIT_PAUSE_MS);
        },
      }),
    [subscribe, fields, commit],
  );

  // A tap on a unit says what the digits already typed mean: the text stays, the value follows.
  const firstUnits = useRef(true);
  useEffect(() => {
    if (firstUnits.current) {
      firstUnits.current = false;
      return;
    }
    commit();
    // A message about the digits in the old unit no longer applies.
    const stale = Object.keys(form.formState.errors);
    if (stale.length > 0) void form.trigger(stale);
  }, [fieldUnits, commit, form]);

  const setFieldUnit = useCallback((name: string, unit: string) => {
    setFieldUnits((current) => (current[name] === unit ? current : { ...current, [name]: unit }));
  }, []);

  return { form, reading, setFieldUnit, commit };
}
