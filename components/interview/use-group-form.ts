"use client";

import { useEffect, useMemo, useRef } from "react";
import { useForm, type FieldErrors, type Resolver } from "react-hook-form";
import type { InterviewAnswers } from "@/lib/interview/answers";
import type { GroupId } from "@/lib/interview/steps";
import { validateGroup } from "@/lib/interview/validate";
import type { ShopSettings } from "@/lib/interview/branches";
import type { FieldDef, FormValues } from "./field-defs";
import { answerValuesOf, formValuesOf } from "./form-values";
import type { UnitPreferences } from "./unit-preferences";

/**
 * One question group as a react-hook-form form. Values are the text typed, in the technician's
 * units; validation converts them and runs the same zod schemas the server uses. Every change is
 * handed to the interview machine at once, valid or not, so nothing typed is ever lost.
 */
export function useGroupForm({
  group,
  fields,
  saved,
  otherAnswers,
  units,
  shop,
  onValues,
}: {
  group: GroupId;
  fields: FieldDef[];
  saved: unknown;
  otherAnswers: InterviewAnswers;
  units: UnitPreferences;
  shop: ShopSettings;
  onValues: (values: Record<string, unknown>) => void;
}) {
  const latest = useRef({ otherAnswers, units, shop, onValues });
  useEffect(() => {
    latest.current = { otherAnswers, units, shop, onValues };
  }, [otherAnswers, units, shop, onValues]);

  const resolver = useMemo<Resolver<FormValues>>(
    () => async (values) => {
      const { otherAnswers: others, units: u, shop: s } = latest.current;
      const check = validateGroup(group, answerValuesOf(fields, values, u), others, s);
      if (check.ok) return { values, errors: {} };
      const errors: FieldErrors<FormValues> = {};
      for (const issue of check.issues) {
        const key = fields.some((f) => f.name === issue.field) ? issue.field : (fields[0]?.name ?? "root");
        errors[key] ??= { type: "validate", message: issue.message };
      }
      return { values: {}, errors };
    },
    [group, fields],
  );

  const form = useForm<FormValues>({
    defaultValues: formValuesOf(fields, saved, units),
    resolver,
    mode: "onTouched",
  });

  // A unit switch rewrites the texts first and the units after: hand the machine the values again
  // once both agree, so 30 psi switched to kPa stays 206.8 kPa and never reads as 30 kPa.
  const { subscribe, getValues } = form;
  const unitsSeen = useRef(units);
  useEffect(() => {
    const seen = unitsSeen.current;
    if (
      seen.pressure === units.pressure &&
      seen.temperature === units.temperature &&
      seen.mass === units.mass &&
      seen.volume === units.volume
    )
      return;
    unitsSeen.current = units;
    latest.current.onValues(answerValuesOf(fields, getValues(), units));
  }, [units, fields, getValues]);

  useEffect(
    () =>
      subscribe({
        formState: { values: true },
        callback: ({ values }) =>
          latest.current.onValues(answerValuesOf(fields, values as FormValues, latest.current.units)),
      }),
    [subscribe, fields],
  );

  return form;
}
