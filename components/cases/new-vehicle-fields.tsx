"use client";

import { useEffect, useState } from "react";
import { SERVICE_REFRIGERANT_OPTIONS } from "@/lib/refrigerants/catalog";
import { EXPANSION_DEVICE_OPTIONS } from "@/lib/vehicles/expansion-devices";
import {
  COMPRESSOR_TYPE_LABELS,
  COMPRESSOR_TYPES,
  type CompressorType,
} from "@/lib/vehicles/compressor-types";
import { SpecLookup } from "./spec-lookup";
import { SelectField } from "@/components/ui/select-field";
import { normaliseVin, vinCheckDigitMatches, vinFormatError } from "@/lib/vehicles/vin";
import { readMassG } from "@/lib/service/entry";
import { massFromG } from "@/lib/units/convert";
import { UNIT_LABELS } from "@/lib/units/reader";
import { useReaderUnits } from "@/components/shell/reader-units";

export interface NewVehicleDraft {
  customer: { name: string; phone?: string; email?: string };
  vehicle: {
    year: number;
    make: string;
    model: string;
    engine?: string;
    vin?: string;
    plate?: string;
    refrigerant: string;
    expansionDevice: string;
    /** absent when the technician does not know it */
    compressorType?: CompressorType;
    electricCompressor: boolean;
    labelChargeG?: number;
  };
  /** What cannot be sent as typed, by the server's field key: the form keeps the text and says why. */
  problems: Record<string, string[]>;
}

const EMPTY = {
  name: "",
  phone: "",
  year: "",
  make: "",
  model: "",
  engine: "",
  vin: "",
  plate: "",
  refrigerant: "R-1234yf",
  expansionDevice: "txv",
  compressorType: "",
  labelChargeG: "",
};

/** The customer and vehicle for a first visit. Server-side validation has the final word. */
export function NewVehicleFields({
  onChange,
  errors,
  initialPhone = "",
}: {
  onChange: (draft: NewVehicleDraft) => void;
  errors: Record<string, string[]>;
  /** Digits typed into the vehicle search that found nothing: most likely the customer's phone. */
  initialPhone?: string;
}) {
  const [f, setF] = useState({ ...EMPTY, phone: initialPhone });
  // The label charge is typed in the reader's mass unit ("20.1" oz), or with its own ("1 lb 4 oz").
  const { units, locale } = useReaderUnits();
  useEffect(() => {
    const labelCharge = readMassG(f.labelChargeG, units.mass, locale ?? undefined);
    onChange({
      customer: { name: f.name, phone: f.phone || undefined },
      vehicle: {
        year: Number(f.year),
        make: f.make,
        model: f.model,
        engine: f.engine || undefined,
        vin: f.vin || undefined,
        plate: f.plate || undefined,
        refrigerant: f.refrigerant,
        expansionDevice: f.expansionDevice,
        compressorType: f.compressorType === "" ? undefined : (f.compressorType as CompressorType),
        electricCompressor: f.compressorType === "electric",
        labelChargeG: "value" in labelCharge ? labelCharge.value : undefined,
      },
      problems: "error" in labelCharge ? { "newVehicle.labelChargeG": [labelCharge.error] } : {},
    });
  }, [f, onChange, units.mass, locale]);

  const vin = normaliseVin(f.vin);
  const vinProblem = vin ? vinFormatError(vin) : null;
  const vinWarning =
    vin && !vinProblem && !vinCheckDigitMatches(vin)
      ? "The 9th character does not match the check digit: recheck the VIN (vehicles built for outside North America may not use one)."
      : null;
  const field = (
    key: keyof typeof EMPTY,
    label: string,
    errorKey: string,
    props: React.InputHTMLAttributes<HTMLInputElement> = {},
  ) => (
    <div>
      <label htmlFor={`nv-${key}`} className="field-label">
        {label}
      </label>
      <input
        id={`nv-${key}`}
        className="field-input"
        value={String(f[key])}
        onChange={(e) => setF({ ...f, [key]: e.target.value })}
        {...props}
      />
      {errors[errorKey]?.[0] && <p className="field-error">{errors[errorKey]![0]}</p>}
    </div>
  );

  return (
    <div className="mt-4 grid gap-4 sm:grid-cols-2">
      {field("name", "Customer name", "newCustomer.name", { autoComplete: "off" })}
      {field("phone", "Customer phone (optional)", "newCustomer.phone", { type: "tel", autoComplete: "off" })}
      {field("plate", "Plate (optional)", "newVehicle.plate", {
        autoCapitalize: "characters",
        autoComplete: "off",
      })}
      <SpecLookup
        onPick={(pick) =>
          setF({
            ...f,
            year: pick.year === undefined ? f.year : String(pick.year),
            make: pick.make,
            model: pick.model,
            refrigerant: pick.refrigerant,
            // Said in the field's unit with enough decimals to come back to the same whole gram.
            labelChargeG: String(Number(massFromG(pick.labelChargeG, units.mass).toFixed(3))),
          })
        }
      />
      {field("year", "Model year", "newVehicle.year", { inputMode: "numeric" })}
      {field("make", "Make", "newVehicle.make")}
      {field("model", "Model", "newVehicle.model")}
      {field("engine", "Engine (optional)", "newVehicle.engine")}
      {field(
        "labelChargeG",
        `Label charge, ${UNIT_LABELS[units.mass]} (optional)`,
        "newVehicle.labelChargeG",
        {
          inputMode: "decimal",
        },
      )}
      <div className="sm:col-span-2">
        {field("vin", "VIN (optional)", "newVehicle.vin", {
          autoCapitalize: "characters",
          autoComplete: "off",
        })}
        {vinProblem && <p className="field-error">{vinProblem}</p>}
        {vinWarning && <p className="mt-1 font-bold text-caution-700">{vinWarning}</p>}
      </div>
      <SelectField
        id="nv-refrigerant"
        label="Refrigerant on the label"
        value={f.refrigerant}
        options={SERVICE_REFRIGERANT_OPTIONS}
        onChange={(refrigerant) => setF({ ...f, refrigerant })}
      />
      <SelectField
        id="nv-device"
        label="Expansion device"
        value={f.expansionDevice}
        options={EXPANSION_DEVICE_OPTIONS}
        onChange={(expansionDevice) => setF({ ...f, expansionDevice })}
      />
      <div className="sm:col-span-2">
        <label htmlFor="nv-compressor" className="field-label">
          Compressor
        </label>
        <select
          id="nv-compressor"
          className="field-input"
          value={f.compressorType}
          onChange={(e) => setF({ ...f, compressorType: e.target.value })}
        >
          <option value="">Not known yet</option>
          {COMPRESSOR_TYPES.map((t) => (
            <option key={t} value={t}>
              {COMPRESSOR_TYPE_LABELS[t]}
            </option>
          ))}
        </select>
      </div>
    </div>
  );
}
