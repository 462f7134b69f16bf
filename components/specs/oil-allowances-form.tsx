"use client";

import { useState } from "react";
import { useMutation } from "@tanstack/react-query";
import { apiFetch, saveErrorOf } from "@/lib/queries/api-fetch";
import { readVolumeMl } from "@/lib/service/entry";
import type { AllowancesMl, OilAllowancesResponse } from "@/lib/contracts/specs";
import { REPLACED_PART_IDS, REPLACED_PART_LABELS, type ReplacedPartId } from "@/lib/service/oil";
import { type VolumeUnit, formatVolume } from "@/lib/units";
import { EntryInput } from "@/components/service/entry-input";
import { ConfirmDialog } from "@/components/ui/confirm-dialog";

/** The shop's figures for the oil each replaced part carries out; empty means "drain and measure". */
export function OilAllowancesForm({
  initial,
  volume,
  canEdit,
  source,
}: {
  initial: AllowancesMl;
  volume: VolumeUnit;
  canEdit: boolean;
  source: string;
}) {
  const [text, setText] = useState<Record<ReplacedPartId, string>>(
    () =>
      Object.fromEntries(
        REPLACED_PART_IDS.map((p) => [p, initial[p] == null ? "" : formatVolume(initial[p] ?? 0, volume)]),
      ) as Record<ReplacedPartId, string>,
  );
  const [errors, setErrors] = useState<Partial<Record<ReplacedPartId, string>>>({});
  const [status, setStatus] = useState<string | null>(null);
  const [saved, setSaved] = useState<AllowancesMl>(initial);
  // Figures about to be cleared wait for a yes: a cleared part is drained and measured instead.
  const [clearing, setClearing] = useState<{ values: AllowancesMl; parts: ReplacedPartId[] } | null>(null);
  const save = useMutation({
    mutationFn: (allowancesMl: AllowancesMl) =>
      apiFetch<OilAllowancesResponse>("/api/specs/oil-allowances", {
        method: "PUT",
        body: { allowancesMl },
      }),
    onSuccess: (answer) => {
      setSaved(answer.allowancesMl);
      setClearing(null);
      setStatus("Saved the shop's oil allowances.");
    },
    onError: (e) => {
      setClearing(null);
      setStatus(saveErrorOf(e).message);
    },
  });

  function submit(e: React.FormEvent) {
    e.preventDefault();
    const next: Partial<Record<ReplacedPartId, string>> = {};
    const values = {} as AllowancesMl;
    for (const p of REPLACED_PART_IDS) {
      const r = readVolumeMl(text[p], volume);
      if ("error" in r) next[p] = r.error;
      else if ("value" in r && r.value > 500) next[p] = "More than 500 mL is not one part's oil.";
      else values[p] = "value" in r ? r.value : null;
    }
    setErrors(next);
    setStatus(null);
    if (Object.keys(next).length > 0) return;
    const cleared = REPLACED_PART_IDS.filter((p) => saved[p] != null && values[p] == null);
    if (cleared.length > 0) setClearing({ values, parts: cleared });
    else save.mutate(values);
  }

  return (
    <form onSubmit={submit} noValidate className="card space-y-3" aria-labelledby="allowances-heading">
      <h2 id="allowances-heading" className="text-xl font-bold">
        Oil carried out by replaced parts
      </h2>
      <p className="text-ink-soft">
        The service record adds these to the oil to put back. Leave a part empty to have the technician drain
        and measure it. The vehicle maker&apos;s figure governs.
      </p>
      <div className="grid grid-cols-2 gap-3">
        {REPLACED_PART_IDS.map((p) =>
          canEdit ? (
            <EntryInput
              key={p}
              label={REPLACED_PART_LABELS[p]}
              value={text[p]}
              onChange={(v) => setText((t) => ({ ...t, [p]: v }))}
              error={errors[p]}
            />
          ) : (
            <p key={p}>
              <strong>{REPLACED_PART_LABELS[p]}:</strong> {text[p] || "drain and measure"}
            </p>
          ),
        )}
      </div>
      <p className="text-sm text-ink-soft">Source of the defaults: {source}</p>
      {status && (
        <p role="status" className="font-bold">
          {status}
        </p>
      )}
      {canEdit && (
        <button type="submit" className="btn-quiet w-full" disabled={save.isPending}>
          {save.isPending ? "Saving…" : "Save the allowances"}
        </button>
      )}
      <ConfirmDialog
        open={clearing !== null}
        title={
          clearing?.parts.length === 1
            ? `Clear the figure for ${REPLACED_PART_LABELS[clearing.parts[0]!].toLowerCase()}?`
            : "Clear these figures?"
        }
        confirmLabel="Clear and save"
        danger
        busy={save.isPending}
        onConfirm={() => clearing && save.mutate(clearing.values)}
        onCancel={() => setClearing(null)}
      >
        {clearing && (
          <>
            <ul className="list-disc pl-5">
              {clearing.parts.map((p) => (
                <li key={p}>
                  {REPLACED_PART_LABELS[p]}: {formatVolume(saved[p] ?? 0, volume)}
                </li>
              ))}
            </ul>
            <p>
              The service record will ask the technician to drain and measure{" "}
              {clearing.parts.length === 1 ? "this part" : "these parts"} instead.
            </p>
          </>
        )}
      </ConfirmDialog>
    </form>
  );
}
