"use client";

import { useState } from "react";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { CreateCylinderInput, CylinderDto, CylinderKind } from "@/lib/contracts/cylinders";
import { apiFetch, ApiError, saveErrorOf } from "@/lib/queries/api-fetch";
import { ledgerKeys } from "@/lib/queries/ledger";
import { SERVICE_REFRIGERANT_OPTIONS } from "@/lib/refrigerants/catalog";
import { massEntryHint, readMassG } from "@/lib/service/entry";
import { type MassUnit, formatMassGrouped } from "@/lib/units";
import { sayInUnits } from "@/lib/units/quantity";
import { useReaderUnits } from "@/components/shell/reader-units";
import { EntryInput } from "@/components/service/entry-input";
import { ConfirmDialog } from "@/components/ui/confirm-dialog";
import { SelectField } from "@/components/ui/select-field";

/** Retiring asks first; reactivating a retired cylinder does not. */
export function RetireButton({ cylinder, massUnit }: { cylinder: CylinderDto; massUnit: MassUnit }) {
  const queryClient = useQueryClient();
  const [asking, setAsking] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const { id, label, retired } = cylinder;
  const change = useMutation({
    mutationFn: () => apiFetch(`/api/cylinders/${id}`, { method: "PATCH", body: { retired: !retired } }),
    onSuccess: () => {
      setAsking(false);
      setError(null);
      return queryClient.invalidateQueries({ queryKey: ledgerKeys.all });
    },
    onError: (e) =>
      setError(e instanceof ApiError ? e.message : "No answer from the server; nothing changed. Try again."),
  });
  return (
    <span>
      <button
        type="button"
        className="btn-quiet"
        onClick={() => {
          setError(null);
          if (retired) change.mutate();
          else setAsking(true);
        }}
        disabled={change.isPending}
        aria-label={`${retired ? "Reactivate" : "Retire"} ${label}`}
      >
        {retired ? "Reactivate" : "Retire…"}
      </button>
      {error && !asking && <span className="field-error ml-2">{error}</span>}
      <ConfirmDialog
        open={asking}
        title={`Retire ${label}?`}
        confirmLabel="Retire the cylinder"
        danger
        busy={change.isPending}
        error={asking ? error : null}
        onConfirm={() => change.mutate()}
        onCancel={() => setAsking(false)}
      >
        <p>
          {label} ({cylinder.refrigerant}, {cylinder.kind}) holds {formatMassGrouped(cylinder.netG, massUnit)}{" "}
          by the ledger. Once retired it is no longer offered for recovery, charging or shipments; its lines
          stay in the ledger, and it can be reactivated.
        </p>
        {cylinder.netG > 0 && (
          <p className="font-bold">
            It still holds refrigerant: send it out or move it before the cylinder leaves the shop. Never vent
            it.
          </p>
        )}
      </ConfirmDialog>
    </span>
  );
}

const CYLINDER_KIND_OPTIONS = [
  { value: "recovery", label: "Recovery" },
  { value: "virgin", label: "Virgin" },
  { value: "recycled", label: "Recycled" },
] as const satisfies readonly { value: CylinderKind; label: string }[];

const EMPTY = {
  label: "",
  serial: "",
  refrigerant: "R-134a",
  kind: "recovery",
  tare: "",
  capacity: "",
  initial: "0",
};

export function AddCylinderForm({ massUnit }: { massUnit: MassUnit }) {
  const queryClient = useQueryClient();
  const [form, setForm] = useState(EMPTY);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [status, setStatus] = useState<string | null>(null);
  const reader = useReaderUnits();
  // The schema's limits are said in the ledger's mass unit, as every figure on this screen.
  const sayMarked = (text: string) => sayInUnits(text, { ...reader.units, mass: massUnit }, reader.at);
  const say = (text: string | undefined) => (text === undefined ? undefined : sayMarked(text));
  const create = useMutation({
    mutationFn: (body: CreateCylinderInput) => apiFetch("/api/cylinders", { method: "POST", body }),
    onSuccess: () => {
      setStatus(`Added ${form.label}.`);
      setForm(EMPTY);
      return queryClient.invalidateQueries({ queryKey: ledgerKeys.all });
    },
    onError: (e) => {
      const { fieldErrors, message } = saveErrorOf(e, sayMarked);
      setErrors(fieldErrors);
      setStatus(message);
    },
  });
  const set = (k: keyof typeof EMPTY) => (v: string) => setForm((f) => ({ ...f, [k]: v }));

  function submit(e: React.FormEvent) {
    e.preventDefault();
    setStatus(null);
    const masses = {
      tareG: readMassG(form.tare, massUnit),
      capacityG: readMassG(form.capacity, massUnit),
      initialNetG: readMassG(form.initial, massUnit),
    };
    const missing: Record<keyof typeof masses, string> = {
      tareG: "The tare is missing: it is stamped on the cylinder's collar.",
      capacityG: "The refrigerant capacity is missing.",
      initialNetG: "Say what it holds now (0 when empty).",
    };
    const next: Record<string, string> = {};
    for (const [k, r] of Object.entries(masses) as [keyof typeof masses, (typeof masses)["tareG"]][])
      if ("error" in r) next[k] = r.error;
      else if ("empty" in r) next[k] = missing[k];
    if (!form.label.trim()) next.label = "The label is missing: use the one written on the cylinder.";
    setErrors(next);
    if (Object.keys(next).length) return;
    const g = (r: (typeof masses)["tareG"]) => ("value" in r ? r.value : 0);
    create.mutate({
      label: form.label,
      serial: form.serial || undefined,
      refrigerant: form.refrigerant as CreateCylinderInput["refrigerant"],
      kind: form.kind as CreateCylinderInput["kind"],
      tareG: g(masses.tareG),
      capacityG: g(masses.capacityG),
      initialNetG: g(masses.initialNetG),
    });
  }

  return (
    <form onSubmit={submit} noValidate className="mt-4 space-y-3 border-t-2 border-paper-line pt-4">
      <h3 className="text-lg font-bold">Add a cylinder</h3>
      <EntryInput
        label="Label on the cylinder"
        inputMode="text"
        value={form.label}
        onChange={set("label")}
        error={errors.label}
      />
      <EntryInput
        label="Serial number (optional)"
        inputMode="text"
        value={form.serial}
        onChange={set("serial")}
        error={errors.serial}
      />
      <div className="grid grid-cols-2 gap-3">
        <SelectField
          id="cyl-refrigerant"
          label="Refrigerant"
          value={form.refrigerant}
          options={SERVICE_REFRIGERANT_OPTIONS}
          onChange={set("refrigerant")}
        />
        <SelectField
          id="cyl-kind"
          label="Kind"
          value={form.kind}
          options={CYLINDER_KIND_OPTIONS}
          onChange={set("kind")}
        />
      </div>
      <EntryInput
        label="Tare (stamped on the collar)"
        value={form.tare}
        onChange={set("tare")}
        error={say(errors.tareG)}
        hint={massEntryHint(massUnit)}
      />
      <EntryInput
        label="Refrigerant capacity"
        value={form.capacity}
        onChange={set("capacity")}
        error={say(errors.capacityG)}
        hint={massEntryHint(massUnit)}
      />
      <EntryInput
        label="Refrigerant in it now"
        value={form.initial}
        onChange={set("initial")}
        error={say(errors.initialNetG)}
        hint={massEntryHint(massUnit)}
      />
      {status && (
        <p role="status" className="font-bold">
          {say(status)}
        </p>
      )}
      <button type="submit" className="btn-primary w-full" disabled={create.isPending}>
        {create.isPending ? "Adding…" : "Add the cylinder"}
      </button>
    </form>
  );
}
