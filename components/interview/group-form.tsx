"use client";

import { memo, useCallback } from "react";
import { clsx } from "clsx";
import { sayInUnits } from "@/lib/units";
import type { FieldDef, FormValues } from "./field-defs";
import { unreadableFields, type Reading } from "./form-values";
import { QuantityInput } from "./quantity-input";
import type { FieldMessages, GroupFormControl } from "./use-group-form";
import { unitsForField, type QuantityKind } from "./unit-preferences";

interface Props {
  control: GroupFormControl;
  values: FormValues;
  errors: FieldMessages;
  fields: FieldDef[];
  reading: Reading;
  /** A tap on one field's unit button: says what its digits mean, changes nothing else. */
  setFieldUnit: (name: string, unit: string) => void;
  /** Takes the group's values as the answer where they are valid (leaving a field, a tap on a choice). */
  commit: () => void;
  /** Computed values to show under a field, keyed by field name. */
  readouts?: Partial<Record<string, React.ReactNode>>;
  /** What each readout says, as text: a field whose key is unchanged keeps its readout on screen. */
  readoutKeys?: Partial<Record<string, string>>;
  serverIssues?: { field: string; message: string }[];
}

const QUANTITY_KINDS = new Set(["pressure", "temperature", "mass", "volume"]);

export function GroupForm({
  control,
  values,
  errors,
  fields,
  reading,
  setFieldUnit,
  commit,
  readouts = {},
  readoutKeys = {},
  serverIssues = [],
}: Props) {
  const questions = new Map(
    unreadableFields(fields, values, reading)
      .filter((u) => u.problem.ambiguous)
      .map((u) => [u.field, u.problem.ambiguous!]),
  );
  const leave = useCallback(
    (e: React.FocusEvent<HTMLElement>) => {
      // Moving to the same field's unit buttons is not leaving it: the tap will say what the digits mean.
      const next = e.relatedTarget as Node | null;
      if (next && e.currentTarget.closest("[data-field]")?.contains(next)) return;
      commit();
    },
    [commit],
  );

  return (
    <div className="space-y-5">
      {fields.map((def) => {
        const serverMessage = serverIssues.find((i) => i.field === def.name)?.message;
        const error =
          errors[def.name] ??
          (serverMessage === undefined ? undefined : sayInUnits(serverMessage, reading.units));
        return (
          <Field
            key={def.name}
            control={control}
            def={def}
            value={values[def.name] ?? (def.kind === "multi" ? NO_CHOICES : "")}
            reading={reading}
            setFieldUnit={setFieldUnit}
            commit={commit}
            leave={leave}
            readout={readouts[def.name]}
            readoutKey={readoutKeys[def.name]}
            error={error}
            question={error ? questions.get(def.name) : undefined}
          />
        );
      })}
    </div>
  );
}

const NO_CHOICES: string[] = [];

interface FieldProps {
  control: GroupFormControl;
  def: FieldDef;
  /** the field's text as typed, or the options ticked */
  value: string | string[];
  reading: Reading;
  setFieldUnit: (name: string, unit: string) => void;
  commit: () => void;
  leave: (e: React.FocusEvent<HTMLElement>) => void;
  readout?: React.ReactNode;
  /** Says what the readout shows: when it is given, an unchanged key means an unchanged readout. */
  readoutKey?: string;
  error?: string;
  question?: { decimal: number; thousands: number };
}

/**
 * One question of the group. A keystroke in one field leaves the others' props unchanged (their readout
 * keys included), so they skip the re-render.
 */
const Field = memo(
  function Field({
    control,
    def,
    value,
    reading,
    setFieldUnit,
    commit,
    leave,
    readout,
    error,
    question,
  }: FieldProps) {
    const id = `f-${def.name}`;
    const describedBy =
      [def.hint ? `${id}-hint` : null, readout ? `${id}-readout` : null, error ? `${id}-error` : null]
        .filter(Boolean)
        .join(" ") || undefined;
    const common = { "aria-invalid": error ? true : undefined, "aria-describedby": describedBy } as const;
    return (
      <div data-field={def.name}>
        {def.kind === "multi" || def.kind === "choice" || def.kind === "yesno" ? (
          <fieldset aria-describedby={describedBy}>
            <legend className="field-label">{def.label}</legend>
            <div
              className={clsx(
                "grid gap-2",
                def.kind === "multi" ? "sm:grid-cols-2" : "grid-cols-2 sm:grid-cols-3",
              )}
            >
              {(def.kind === "yesno"
                ? [
                    { value: "yes", label: "Yes" },
                    { value: "no", label: "No" },
                  ]
                : def.options
              ).map((option) => {
                const selected =
                  def.kind === "multi" ? (value as string[]).includes(option.value) : value === option.value;
                return (
                  <button
                    key={option.value}
                    type="button"
                    aria-pressed={selected}
                    onClick={() => {
                      if (def.kind === "multi") {
                        const list = value as string[];
                        control.change(
                          def.name,
                          selected ? list.filter((v) => v !== option.value) : [...list, option.value],
                        );
                      } else {
                        control.change(
                          def.name,
                          selected && (def.kind === "yesno" || ("optional" in def && def.optional))
                            ? ""
                            : option.value,
                        );
                      }
                      control.blur(def.name);
                      commit();
                    }}
                    className={clsx(
                      "min-h-glove rounded-card border-2 px-3 py-2 text-left font-bold",
                      selected
                        ? "border-glacier-700 bg-glacier-700 text-white"
                        : "border-ink-muted bg-paper text-ink",
                    )}
                  >
                    {option.label}
                  </button>
                );
              })}
            </div>
          </fieldset>
        ) : (
          <>
            <label htmlFor={id} className="field-label">
              {def.label}
              {def.kind === "plain" && <span className="font-normal text-ink-soft"> ({def.unit})</span>}
            </label>
            {QUANTITY_KINDS.has(def.kind) ? (
              <QuantityInput
                id={id}
                kind={def.kind as QuantityKind}
                units={unitsForField(reading.units, reading.fieldUnits ?? {}, def.name, def.kind)}
                unitGroupLabel={`Unit for ${def.label.toLowerCase()}`}
                onUnitChange={(unit) => setFieldUnit(def.name, unit)}
                {...common}
                name={def.name}
                value={value as string}
                onChange={(e) => control.change(def.name, e.target.value)}
                onBlur={(e) => {
                  leave(e);
                  control.blur(def.name);
                }}
              />
            ) : def.kind === "text" && def.multiline ? (
              <textarea
                id={id}
                rows={3}
                className="field-input py-2"
                {...common}
                name={def.name}
                value={value as string}
                onChange={(e) => control.change(def.name, e.target.value)}
                onBlur={(e) => {
                  leave(e);
                  control.blur(def.name);
                }}
              />
            ) : (
              <input
                id={id}
                type="text"
                inputMode={def.kind === "plain" ? "decimal" : undefined}
                autoComplete="off"
                placeholder={def.kind === "plain" ? def.placeholder : undefined}
                className={clsx("field-input", def.kind === "plain" && "font-mono text-2xl")}
                {...common}
                name={def.name}
                value={value as string}
                onChange={(e) => control.change(def.name, e.target.value)}
                onBlur={(e) => {
                  leave(e);
                  control.blur(def.name);
                }}
              />
            )}
          </>
        )}
        {def.hint && (
          <p id={`${id}-hint`} className="mt-1 text-sm text-ink-soft">
            {def.hint}
          </p>
        )}
        {readout && (
          <div id={`${id}-readout`} className="mt-1" aria-live="polite">
            {readout}
          </div>
        )}
        {error && (
          <p id={`${id}-error`} className="field-error" role="alert">
            {error}
          </p>
        )}
        {question && (
          <div className="mt-2 flex gap-2">
            {[question.decimal, question.thousands].map((value) => (
              <button
                key={value}
                type="button"
                className="btn-quiet min-h-glove flex-1 font-mono"
                onClick={() => {
                  control.setValue(def.name, String(value));
                  commit();
                }}
              >
                {String(value)}
              </button>
            ))}
          </div>
        )}
      </div>
    );
  },
  (before, after) =>
    before.control === after.control &&
    before.def === after.def &&
    before.value === after.value &&
    before.reading === after.reading &&
    before.setFieldUnit === after.setFieldUnit &&
    before.commit === after.commit &&
    before.leave === after.leave &&
    before.error === after.error &&
    before.question?.decimal === after.question?.decimal &&
    before.question?.thousands === after.question?.thousands &&
    (after.readoutKey === undefined
      ? before.readout === after.readout
      : before.readoutKey === after.readoutKey &&
        (before.readout === undefined) === (after.readout === undefined)),
);
