"use client";

import { forwardRef } from "react";
import { clsx } from "clsx";
import { UNIT_CHOICES, UNIT_LABELS } from "@/lib/units";
import type { QuantityKind, UnitPreferences } from "./unit-preferences";

type Props = React.InputHTMLAttributes<HTMLInputElement> & {
  kind: QuantityKind;
  units: UnitPreferences;
  onUnitChange: (unit: string) => void;
  unitGroupLabel: string;
};

/**
 * A large numeric input with the unit buttons beside it. A button says what the typed digits mean;
 * it never changes them (reading the gauge, then choosing its unit, is the natural order).
 */
export const QuantityInput = forwardRef<HTMLInputElement, Props>(function QuantityInput(
  { kind, units, onUnitChange, unitGroupLabel, id, ...props },
  ref,
) {
  const current = units[kind];
  return (
    <div className="flex items-stretch gap-2">
      <input
        ref={ref}
        id={id}
        type="text"
        inputMode="decimal"
        autoComplete="off"
        className="field-input min-w-0 flex-1 font-mono text-2xl"
        {...props}
      />
      <div
        role="group"
        aria-label={unitGroupLabel}
        className="flex overflow-hidden rounded-card border-2 border-ink-muted"
      >
        {(UNIT_CHOICES[kind] as readonly string[]).map((unit) => (
          <button
            key={unit}
            type="button"
            aria-pressed={unit === current}
            onClick={() => onUnitChange(unit)}
            className={clsx(
              "min-h-glove min-w-touch px-2 font-bold",
              unit === current ? "bg-glacier-700 text-white" : "bg-paper text-ink",
            )}
          >
            {UNIT_LABELS[unit] ?? unit}
          </button>
        ))}
      </div>
    </div>
  );
});
