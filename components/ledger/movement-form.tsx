"use client";

import { useState } from "react";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { CylinderDto } from "@/lib/contracts/cylinders";
import { LEDGER_MASS_MAX_G, type ManualMovementInput } from "@/lib/contracts/ledger";
import { apiFetch, ApiError, saveErrorOf } from "@/lib/queries/api-fetch";
import { ledgerKeys } from "@/lib/queries/ledger";
import { massEntryHint, readMassG } from "@/lib/service/entry";
import { type MassUnit, formatMassGrouped } from "@/lib/units";
import { EntryInput } from "@/components/service/entry-input";

const EMPTY = { cylinderId: "", type: "recycled", mass: "", when: "", destination: "", note: "" };

/** What the technician typed, with the unit a bare number was read in. */
function asTyped(text: string, massUnit: MassUnit): string {
  const t = text.trim();
  return /[a-z]/i.test(t) ? t : `${t} ${massUnit}`;
}

/** Recycling, sending refrigerant out for reclaim, and weighed corrections: the movements no service record posts. */
export function MovementForm({ cylinders, massUnit }: { cylinders: CylinderDto[]; massUnit: MassUnit }) {
  const queryClient = useQueryClient();
  const [form, setForm] = useState(EMPTY);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [status, setStatus] = useState<string | null>(null);
  const post = useMutation({
    mutationFn: (body: ManualMovementInput) => apiFetch("/api/ledger/movements", { method: "POST", body }),
    onSuccess: () => {
      setStatus("Posted to the ledger.");
      setForm(EMPTY);
      return queryClient.invalidateQueries({ queryKey: ledgerKeys.all });
    },
    onError: (e) => {
      const { fieldErrors, message } = saveErrorOf(e);
      // A refusal with the cylinder's figures is said once, in the status line, not again under the field.
      const refused = e instanceof ApiError && e.code === "conflict:ledger";
      setErrors(refused ? {} : fieldErrors);
      setStatus(refused ? `${e.message} Nothing was posted; what you typed is kept.` : message);
    },
  });
  const set = (k: keyof typeof EMPTY) => (v: string) => setForm((f) => ({ ...f, [k]: v }));

  function submit(e: React.FormEvent) {
    e.preventDefault();
    setStatus(null);
    const negative = form.type === "adjustment" && /^[-\u2212]/.test(form.mass.trim());
    const typed = form.mass.trim().replace(/^[-\u2212]\s*/, "");
    const mass = readMassG(typed, massUnit);
    const cylinder = cylinders.find((c) => String(c.id) === form.cylinderId);
    const largestG = Math.max(0, ...cylinders.map((c) => c.capacityG));
    const next: Record<string, string> = {};
    if (!form.cylinderId) next.cylinderId = "Choose a cylinder.";
    if ("error" in mass) next.massG = mass.error;
    else if ("empty" in mass) next.massG = "The mass is missing.";
    else if (mass.value === 0) next.massG = "The mass must be more than zero.";
    else if (mass.value > Math.min(LEDGER_MASS_MAX_G, largestG || LEDGER_MASS_MAX_G))
      next.massG = `${asTyped(typed, massUnit)} is more than any cylinder here holds. Check the figure and its unit.`;
    else if (cylinder && mass.value > cylinder.capacityG)
      next.massG = `${asTyped(typed, massUnit)} is more than ${cylinder.label} holds when full (${formatMassGrouped(cylinder.capacityG, massUnit)}).`;
    const when = form.when ? new Date(form.when) : null;
    if (when && Number.isNaN(when.getTime())) next.occurredAt = "The date and time could not be read.";
    else if (when && when.getTime() > Date.now())
      next.occurredAt = "A ledger line cannot be dated in the future.";
    setErrors(next);
    if (Object.keys(next).length) return;
    const massG = "value" in mass ? mass.value * (negative ? -1 : 1) : 0;
    post.mutate({
      cylinderId: Number(form.cylinderId),
      type: form.type as ManualMovementInput["type"],
      massG,
      occurredAt: when ? when.toISOString() : undefined,
      destination: form.destination || undefined,
      note: form.note || undefined,
    });
  }

  return (
    <form onSubmit={submit} noValidate className="mt-4 space-y-3 border-t-2 border-paper-line pt-4">
      <h3 className="text-lg font-bold">Post recycling, a shipment or a weighed correction</h3>
      <div>
        <label htmlFor="mv-cylinder" className="field-label">
          Cylinder
        </label>
        <select
          id="mv-cylinder"
          className="field-input"
          value={form.cylinderId}
          onChange={(e) => set("cylinderId")(e.target.value)}
          aria-invalid={errors.cylinderId ? true : undefined}
        >
          <option value="">Choose a cylinder</option>
          {cylinders
            .filter((c) => !c.retired)
            .map((c) => (
              <option key={c.id} value={c.id}>
                {c.label} ({c.refrigerant}, {c.kind})
              </option>
            ))}
        </select>
        {errors.cylinderId && <p className="field-error">{errors.cylinderId}</p>}
      </div>
      <div>
        <label htmlFor="mv-type" className="field-label">
          What happened
        </label>
        <select
          id="mv-type"
          className="field-input"
          value={form.type}
          onChange={(e) => set("type")(e.target.value)}
        >
          <option value="recycled">Recycled in the shop&apos;s machine</option>
          <option value="sent_out">Sent out for reclaim or destruction</option>
          <option value="adjustment">Weighed correction (may be negative)</option>
        </select>
      </div>
      <EntryInput
        label="Mass"
        value={form.mass}
        onChange={set("mass")}
        error={errors.massG}
        hint={
          form.type === "adjustment"
            ? `${massEntryHint(massUnit)} Start with a minus sign when the scale shows less than the ledger.`
            : massEntryHint(massUnit)
        }
      />
      <EntryInput
        label="When it happened (empty: now)"
        type="datetime-local"
        value={form.when}
        onChange={set("when")}
        error={errors.occurredAt}
      />
      {form.type === "sent_out" && (
        <EntryInput
          label="Sent to (facility)"
          inputMode="text"
          value={form.destination}
          onChange={set("destination")}
          error={errors.destination}
        />
      )}
      <EntryInput
        label={form.type === "adjustment" ? "Why the weighed mass differs" : "Note (optional)"}
        inputMode="text"
        value={form.note}
        onChange={set("note")}
        error={errors.note}
      />
      <p role="status" className="min-h-6 font-bold" data-testid="movement-form-status">
        {status}
      </p>
      <button type="submit" className="btn-quiet w-full" disabled={post.isPending}>
        {post.isPending ? "Posting…" : "Post to the ledger"}
      </button>
    </form>
  );
}
