"use client";

import { useState } from "react";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { apiFetch, ApiError } from "@/lib/queries/api-fetch";
import type { SpecEntryDto } from "@/lib/contracts/specs";
import { specKeys, specsQuery } from "@/lib/queries/specs";
import { type MassUnit, type VolumeUnit, formatMass, formatVolume } from "@/lib/units";
import { ConfirmDialog } from "@/components/ui/confirm-dialog";
import { SpecForm } from "./spec-form";

/** "2015–2019 Mazda 3 2.0 L", the way the row reads in the list. */
function rowName(r: SpecEntryDto): string {
  return `${r.yearFrom}–${r.yearTo} ${r.make} ${r.model}${r.variant ? ` ${r.variant}` : ""}`;
}

export function SpecTable({
  canEdit,
  mass,
  volume,
  initialQuery = "",
}: {
  canEdit: boolean;
  mass: MassUnit;
  volume: VolumeUnit;
  initialQuery?: string;
}) {
  const [q, setQ] = useState(initialQuery);
  const [editing, setEditing] = useState<SpecEntryDto | "new" | null>(null);
  const [status, setStatus] = useState<string | null>(null);
  const [deleting, setDeleting] = useState<SpecEntryDto | null>(null);
  const { data: rows = [], isFetching } = useQuery(specsQuery(q.trim()));
  const queryClient = useQueryClient();
  const remove = useMutation({
    mutationFn: (row: SpecEntryDto) => apiFetch(`/api/specs/${row.id}`, { method: "DELETE" }),
    onSuccess: (_data, row) => {
      setDeleting(null);
      setStatus(`Deleted the row for ${rowName(row)}.`);
      return queryClient.invalidateQueries({ queryKey: specKeys.all });
    },
  });
  const removeError = remove.error
    ? remove.error instanceof ApiError
      ? remove.error.message
      : "No answer from the server; nothing was deleted. Try again."
    : null;

  return (
    <section aria-labelledby="specs-heading" className="card space-y-3">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h2 id="specs-heading" className="text-xl font-bold">
          The shop&apos;s spec table
        </h2>
        <a
          className="btn-quiet"
          href={`/api/specs/export${mass === "oz" ? "?charge=oz&oil=floz" : ""}`}
          download
        >
          Export CSV
        </a>
      </div>
      <label htmlFor="spec-search" className="field-label">
        Search by make, model, variant or year
      </label>
      <input
        id="spec-search"
        type="search"
        className="field-input"
        value={q}
        onChange={(e) => setQ(e.target.value)}
        autoComplete="off"
      />
      {canEdit && editing !== "new" && (
        <button type="button" className="btn-primary w-full" onClick={() => setEditing("new")}>
          Add a row
        </button>
      )}
      {editing === "new" && (
        <SpecForm row={null} mass={mass} volume={volume} onDone={() => setEditing(null)} />
      )}
      {status && <p role="status">{status}</p>}
      <ul className="divide-y divide-paper-line" aria-busy={isFetching}>
        {rows.map((r) =>
          editing !== "new" && editing?.id === r.id ? (
            <li key={r.id} className="py-2">
              <SpecForm row={r} mass={mass} volume={volume} onDone={() => setEditing(null)} />
            </li>
          ) : (
            <li key={r.id} className="flex flex-wrap items-center gap-2 py-3">
              <div className="min-w-0 flex-1">
                <p className="font-bold">
                  {r.yearFrom}–{r.yearTo} {r.make} {r.model} {r.variant}
                </p>
                <p>
                  {r.rearAc ? "Front and rear A/C" : "Front A/C only"} · {r.refrigerant} ·{" "}
                  <strong>{formatMass(r.labelChargeG, mass)}</strong> · {r.oilType}
                  {r.totalOilMl ? ` · ${formatVolume(r.totalOilMl, volume)} oil` : ""}
                </p>
              </div>
              {canEdit && (
                <>
                  <button
                    type="button"
                    className="btn-quiet"
                    onClick={() => setEditing(r)}
                    aria-label={`Edit ${r.make} ${r.model} ${r.variant} ${r.yearFrom}–${r.yearTo}`}
                  >
                    Edit
                  </button>
                  <button
                    type="button"
                    className="btn-quiet"
                    onClick={() => {
                      remove.reset();
                      setStatus(null);
                      setDeleting(r);
                    }}
                    aria-label={`Delete ${rowName(r)}`}
                  >
                    Delete…
                  </button>
                </>
              )}
            </li>
          ),
        )}
        {rows.length === 0 && <li className="py-3 text-ink-soft">No row matches.</li>}
      </ul>
      <ConfirmDialog
        open={deleting !== null}
        title={deleting ? `Delete ${rowName(deleting)}?` : "Delete a row?"}
        confirmLabel="Delete the row"
        danger
        busy={remove.isPending}
        error={removeError}
        onConfirm={() => deleting && remove.mutate(deleting)}
        onCancel={() => setDeleting(null)}
      >
        {deleting && (
          <p>
            {deleting.refrigerant}, label charge {formatMass(deleting.labelChargeG, mass)}, {deleting.oilType}
            . The row leaves the shop&apos;s table for good; a row a service record used cannot be deleted,
            only corrected.
          </p>
        )}
      </ConfirmDialog>
    </section>
  );
}
