"use client";

import { Controller, type UseFormReturn } from "react-hook-form";
import { clsx } from "clsx";
import type { FieldDef, FormValues } from "./field-defs";
import { QuantityInput } from "./quantity-input";
import { fromInternal, toInternal } from "./quantities";
import type { QuantityKind, UnitPreferences } from "./unit-preferences";

interface Props {
  form: UseFormReturn<FormValues>;
  fields: FieldDef[];
  units: UnitPreferences;
  setUnit: (kind: QuantityKind, unit: string) => void;
  /** Computed values to show under a field, keyed by field name. */
  readouts?: Partial<Record<string, React.ReactNode>>;
  serverIssues?: { field: string; message: string }[];
}

const QUANTITY_KINDS = new Set(["pressure", "temperature", "mass", "volume"]);

export function GroupForm({ form, fields, units, setUnit, readouts = {}, serverIssues = [] }: Props) {
  const { register, formState, control, getValues, setValue } = form;

  function changeUnit(kind: QuantityKind, unit: string) {
    // Keep the quantity, not the digits: 30 psi becomes 206.8 kPa.
    const next = { ...units, [kind]: unit } as UnitPreferences;
    for (const def of fields) {
      if (def.kind !== kind) continue;
      const text = getValues(def.name);
      if (typeof text !== "string" || text.trim() === "") continue;
      const internal = toInternal(kind, text, units);
      if (typeof internal === "number")
        setValue(def.name, fromInternal(kind, internal, next), { shouldDirty: true });
    }
    setUnit(kind, unit);
  }

  return (
    <div className="space-y-5">
      {fields.map((def) => {
        const id = `f-${def.name}`;
        const error =
          formState.errors[def.name]?.message ?? serverIssues.find((i) => i.field === def.name)?.message;
        const describedBy =
          [
            def.hint ? `${id}-hint` : null,
            readouts[def.name] ? `${id}-readout` : null,
            error ? `${id}-error` : null,
          ]
            .filter(Boolean)
            .join(" ") || undefined;
        const common = { "aria-invalid": error ? true : undefined, "aria-describedby": describedBy } as const;
        return (
          <div key={def.name}>
            {def.kind === "multi" || def.kind === "choice" || def.kind === "yesno" ? (
              <Controller
                control={control}
                name={def.name}
                render={({ field }) => (
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
                          def.kind === "multi"
                            ? (field.value as string[]).includes(option.value)
                            : field.value === option.value;
                        return (
                          <button
                            key={option.value}
                            type="button"
                            aria-pressed={selected}
                            onClick={() => {
                              if (def.kind === "multi") {
                                const list = field.value as string[];
                                field.onChange(
                                  selected ? list.filter((v) => v !== option.value) : [...list, option.value],
                                );
                              } else {
                                field.onChange(
                                  selected && (def.kind === "yesno" || ("optional" in def && def.optional))
                                    ? ""
                                    : option.value,
                                );
                              }
                              field.onBlur();
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
                )}
              />
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
                    units={units}
                    unitGroupLabel={`Unit for ${def.label.toLowerCase()}`}
                    onUnitChange={(unit) => changeUnit(def.kind as QuantityKind, unit)}
                    {...common}
                    {...register(def.name)}
                  />
                ) : def.kind === "text" && def.multiline ? (
                  <textarea
                    id={id}
                    rows={3}
                    className="field-input py-2"
                    {...common}
                    {...register(def.name)}
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
                    {...register(def.name)}
                  />
                )}
              </>
            )}
            {def.hint && (
              <p id={`${id}-hint`} className="mt-1 text-sm text-ink-soft">
                {def.hint}
              </p>
            )}
            {readouts[def.name] && (
              <div id={`${id}-readout`} className="mt-1" aria-live="polite">
                {readouts[def.name]}
              </div>
            )}
            {error && (
              <p id={`${id}-error`} className="field-error" role="alert">
                {error}
              </p>
            )}
          </div>
        );
      })}
    </div>
  );
}
