"use client";

import { useCallback, useEffect, useMemo, useRef, useState } from "react";
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

/** A message per field name, in the reader's units. */
export type FieldMessages = Partial<Record<string, string>>;

/**
 * What a field does with the group's values. The object keeps its identity for the life of the step,
 * so a field whose own value, message and readout did not change skips a keystroke elsewhere.
 */
export interface GroupFormControl {
  getValues: () => FormValues;
  /** A keystroke or a tap: the new text (or list) of one field; a field already left is checked again. */
  change: (name: string, value: string | string[]) => void;
  /** Leaving a field: from now on it is checked as it changes, and it is checked now. */
  blur: (name: string) => void;
  /** Sets a field's text as if typed (a spec-table row, a tap on a reading's meaning) and checks it. */
  setValue: (name: string, value: string | string[]) => void;
  /** Checks these fields (every field when none are named); returns every field's messages. */
  trigger: (names?: readonly string[]) => FieldMessages;
  setFocus: (name: string) => void;
}

/**
 * One question group as a small form of its own. Values are the text typed, in each field's unit;
 * checking reads them by the person's locale, converts them and runs the same zod schemas the server
 * uses. A field's message shows once it has been left (or on Next) and then follows every keystroke.
 * Every change goes to the interview machine as a draft at once, so nothing typed is lost; it becomes
 * the answer only on leaving the field, on Next, or after a pause.
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

  // The values as typed live in a ref, read at once by commit() after a tap; the state redraws.
  const [values, setValues] = useState<FormValues>(() => formValuesOf(fields, saved, { units, locale }));
  const current = useRef(values);
  const [errors, setErrors] = useState<FieldMessages>({});
  const shownErrors = useRef<FieldMessages>({});
  const touched = useRef(new Set<string>());

  /** Every field's message for these values: unreadable numbers first, then the group's schema. */
  const problemsOf = useCallback(
    (all: FormValues): FieldMessages => {
      const { otherAnswers: others, reading: r, shop: s } = latest.current;
      const found: FieldMessages = {};
      for (const { field, problem } of unreadableFields(fields, all, r)) found[field] = problem.message;
      if (Object.keys(found).length > 0) return found;
      const check = validateGroup(group, answerValuesOf(fields, all, r), others, s);
      if (check.ok) return found;
      for (const issue of check.issues) {
        const key = fields.some((f) => f.name === issue.field) ? issue.field : (fields[0]?.name ?? "root");
        found[key] ??= sayInUnits(issue.message, r.units);
      }
      return found;
    },
    [group, fields],
  );

  const pause = useRef<ReturnType<typeof setTimeout> | undefined>(undefined);
  const commit = useCallback(() => {
    clearTimeout(pause.current);
    latest.current.onValues(answerValuesOf(fields, current.current, latest.current.reading), "commit");
  }, [fields]);
  useEffect(() => () => clearTimeout(pause.current), []);

  const control = useMemo<GroupFormControl>(() => {
    const check = (names: readonly string[] | undefined): FieldMessages => {
      const found = problemsOf(current.current);
      let next = found;
      if (names !== undefined) {
        next = { ...shownErrors.current };
        for (const name of names) {
          if (found[name] === undefined) delete next[name];
          else next[name] = found[name];
        }
      }
      shownErrors.current = next;
      setErrors(next);
      return found;
    };
    const write = (name: string, value: string | string[]) => {
      current.current = { ...current.current, [name]: value };
      setValues(current.current);
      latest.current.onValues(answerValuesOf(fields, current.current, latest.current.reading), "typing");
      clearTimeout(pause.current);
      pause.current = setTimeout(commit, COMMIT_PAUSE_MS);
    };
    return {
      getValues: () => current.current,
      change: (name, value) => {
        write(name, value);
        if (touched.current.has(name)) check([name]);
      },
      blur: (name) => {
        touched.current.add(name);
        check([name]);
      },
      setValue: (name, value) => {
        write(name, value);
        check([name]);
      },
      trigger: (names) => check(names),
      setFocus: (name) => document.getElementById(`f-${name}`)?.focus(),
    };
  }, [fields, commit, problemsOf]);

  // A tap on a unit says what the digits already typed mean: the text stays, the value follows.
  const firstUnits = useRef(true);
  useEffect(() => {
    if (firstUnits.current) {
      firstUnits.current = false;
      return;
    }
    commit();
    // A message about the digits in the old unit no longer applies.
    const stale = Object.keys(shownErrors.current);
    if (stale.length > 0) control.trigger(stale);
  }, [fieldUnits, commit, control]);

  const setFieldUnit = useCallback((name: string, unit: string) => {
    setFieldUnits((now) => (now[name] === unit ? now : { ...now, [name]: unit }));
  }, []);

  return { control, values, errors, reading, setFieldUnit, commit };
}
