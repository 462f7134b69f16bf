"use client";

import { useState } from "react";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { SpecEntryDto, SpecInput } from "@/lib/contracts/specs";
import { apiFetch, saveErrorOf } from "@/lib/queries/api-fetch";
import { specKeys } from "@/lib/queries/specs";
import { SERVICE_REFRIGERANT_OPTIONS } from "@/lib/refrigerants/catalog";
import { readMassG, readVolumeMl } from "@/lib/service/entry";
import { LABEL_CHARGE_RANGE_G, TOTAL_OIL_RANGE_ML } from "@/lib/specs";
import { type MassUnit, type VolumeUnit, formatMass, formatVolume } from "@/lib/units";
import { EntryInput } from "@/components/service/entry-input";
import { SelectField } from "@/components/ui/select-field";
import {
  COMPRESSOR_TYPE_LABELS,
  COMPRESSOR_TYPES,
  type CompressorType,
} from "@/lib/vehicles/compressor-types";

type FormText = {
  yearFrom: string;
  yearTo: string;
  make: string;
  model: string;
  variant: string;
  rearAc: boolean;
  refrigerant: string;
  charge: string;
  oilType: string;
  totalOil: string;
  compressorType: string;
};

function initial(row: SpecEntryDto | null, mass: MassUnit, volume: VolumeUnit): FormText {
  return {
    yearFrom: row ? String(row.yearFrom) : "",
    yearTo: row ? String(row.yearTo) : "",
    make: row?.make ?? "",
    model: row?.model ?? "",
    variant: row?.variant ?? "",
    rearAc: row?.rearAc ?? false,
    refrigerant: row?.refrigerant ?? "R-1234yf",
    charge: row ? formatMass(row.labelChargeG, mass) : "",
    oilType: row?.oilType ?? "",
    totalOil: row?.totalOilMl ? formatVolume(row.totalOilMl, volume) : "",
    compressorType: row?.compressorType ?? "",
  };
}

/** Add or edit one row; values typed in any unit are sent as grams and millilitres. */
export function SpecForm({
  row,
  mass,
  volume,
  onDone,
}: {
  row: SpecEntryDto | null;
  mass: MassUnit;
  volume: VolumeUnit;
  onDone: () => void;
}) {
  const queryClient = useQueryClient();
  const [form, setForm] = useState(() => initial(row, mass, volume));
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [status, setStatus] = useState<string | null>(null);
  const save = useMutation({
    mutationFn: (body: SpecInput) =>
      apiFetch(row ? `/api/specs/${row.id}` : "/api/specs", { method: row ? "PUT" : "POST", body }),
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: specKeys.all });
      onDone();
    },
    onError: (e) => {
      const { fieldErrors, message } = saveErrorOf(e);
      setErrors(fieldErrors);
      setStatus(message);
    },
  });
  const set = (k: keyof FormText) => (v: string) => setForm((f) => ({ ...f, [k]: v }));

  function submit(e: React.FormEvent) {
    e.preventDefault();
    const charge = readMassG(form.charge, mass);
    const oil = readVolumeMl(form.totalOil, volume);
    const next: Record<string, string> = {};
    const band = (g: number, range: { min: number; max: number }) => g < range.min || g > range.max;
    if ("error" in charge) next.labelChargeG = charge.error;
    else if ("empty" in charge) next.labelChargeG = "The label charge is missing.";
    else if (band(charge.value, LABEL_CHARGE_RANGE_G))
      next.labelChargeG = `${formatMass(charge.value, mass)} is outside the label charges of cars and light trucks (${formatMass(LABEL_CHARGE_RANGE_G.min, mass)} to ${formatMass(LABEL_CHARGE_RANGE_G.max, mass)}): check the figure and its unit.`;
    if ("error" in oil) next.totalOilMl = oil.error;
    else if ("value" in oil && band(oil.value, TOTAL_OIL_RANGE_ML))
      next.totalOilMl = `${formatVolume(oil.value, volume)} is outside the oil a car or light truck holds (${formatVolume(TOTAL_OIL_RANGE_ML.min, volume)} to ${formatVolume(TOTAL_OIL_RANGE_ML.max, volume)}): check the figure and its unit.`;
    if (!form.make.trim()) next.make = "Make is missing.";
    if (!form.model.trim()) next.model = "Model is missing.";
    if (!form.oilType.trim()) next.oilType = "The oil type is missing.";
    const yearWords = { yearFrom: "The first year", yearTo: "The last year" } as const;
    for (const k of ["yearFrom", "yearTo"] as const)
      if (form[k].trim() === "") next[k] = `${yearWords[k]} is missing.`;
      else if (!/^\d{4}$/.test(form[k].trim())) next[k] = "A year has four digits, for example 2016.";
    if (!next.yearFrom && !next.yearTo && Number(form.yearFrom) > Number(form.yearTo))
      next.yearTo = "The first year is after the last.";
    setErrors(next);
    setStatus(null);
    if (Object.keys(next).length) return;
    save.mutate({
      yearFrom: Number(form.yearFrom),
      yearTo: Number(form.yearTo),
      make: form.make,
      model: form.model,
      variant: form.variant,
      rearAc: form.rearAc,
      refrigerant: form.refrigerant as SpecInput["refrigerant"],
      labelChargeG: "value" in charge ? charge.value : 0,
      oilType: form.oilType,
      totalOilMl: "value" in oil ? oil.value : null,
      compressorType: form.compressorType === "" ? null : (form.compressorType as CompressorType),
    });
  }

  return (
    <form
      onSubmit={submit}
      noValidate
      className="space-y-3 rounded-card border-2 border-glacier-500 p-3"
      aria-label={row ? "Edit spec row" : "New spec row"}
    >
      <div className="grid grid-cols-2 gap-3">
        <EntryInput
          label="Year from"
          value={form.yearFrom}
          onChange={set("yearFrom")}
          error={errors.yearFrom}
        />
        <EntryInput label="Year to" value={form.yearTo} onChange={set("yearTo")} error={errors.yearTo} />
      </div>
      <EntryInput
        label="Make"
        inputMode="text"
        value={form.make}
        onChange={set("make")}
        error={errors.make}
      />
      <EntryInput
        label="Model"
        inputMode="text"
        value={form.model}
        onChange={set("model")}
        error={errors.model}
      />
      <EntryInput
        label="Engine or variant (empty: every variant)"
        inputMode="text"
        value={form.variant}
        onChange={set("variant")}
        error={errors.variant}
      />
      <label className="flex min-h-glove items-center gap-3">
        <input
          type="checkbox"
          className="h-6 w-6"
          checked={form.rearAc}
          onChange={(e) => setForm((f) => ({ ...f, rearAc: e.target.checked }))}
        />
        <span className="font-bold">Front and rear A/C</span>
      </label>
      <SelectField
        id="spec-refrigerant"
        label="Refrigerant"
        value={form.refrigerant}
        options={SERVICE_REFRIGERANT_OPTIONS}
        onChange={set("refrigerant")}
      />
      <EntryInput
        label="Label charge"
        value={form.charge}
        onChange={set("charge")}
        error={errors.labelChargeG}
        hint="650 g, 1.4 kg or 1 lb 7 oz."
      />
      <EntryInput
        label="Oil type"
        inputMode="text"
        value={form.oilType}
        onChange={set("oilType")}
        error={errors.oilType}
      />
      <EntryInput
        label="Total oil in the system (optional)"
        value={form.totalOil}
        onChange={set("totalOil")}
        error={errors.totalOilMl}
      />
      <div>
        <label htmlFor="spec-compressor" className="field-label">
          Compressor (optional)
        </label>
        <select
          id="spec-compressor"
          className="field-input"
          value={form.compressorType}
          onChange={(e) => set("compressorType")(e.target.value)}
        >
          <option value="">Not stated</option>
          {COMPRESSOR_TYPES.map((t) => (
            <option key={t} value={t}>
              {COMPRESSOR_TYPE_LABELS[t]}
            </option>
          ))}
        </select>
      </div>
      {status && (
        <p role="alert" className="field-error">
          {status}
        </p>
      )}
      <div className="flex gap-2">
        <button type="submit" className="btn-primary flex-1" disabled={save.isPending}>
          {save.isPending ? "Saving…" : row ? "Save the row" : "Add the row"}
        </button>
        <button type="button" className="btn-quiet" onClick={onDone}>
          Cancel
        </button>
      </div>
    </form>
  );
}
