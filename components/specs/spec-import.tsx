"use client";

import { useState } from "react";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { clsx } from "clsx";
import type { SpecImportCommitResponse, SpecImportPreviewResponse } from "@/lib/contracts/specs";
import type { SpecCsvParse } from "@/lib/specs";
import { apiFetch, ApiError } from "@/lib/queries/api-fetch";
import { specKeys } from "@/lib/queries/specs";

/** Paste or choose a CSV, see every row's problems, then save only the rows without any. */
export function SpecImport() {
  const queryClient = useQueryClient();
  const [csv, setCsv] = useState("");
  const [preview, setPreview] = useState<SpecCsvParse | null>(null);
  const [status, setStatus] = useState<string | null>(null);
  const fail = (e: unknown) =>
    setStatus(
      e instanceof ApiError
        ? `${e.message} The file text is kept.`
        : "No answer from the server; the file text is kept.",
    );
  const check = useMutation({
    mutationFn: () =>
      apiFetch<SpecImportPreviewResponse>("/api/specs/import?step=preview", {
        method: "POST",
        body: { csv },
      }),
    onSuccess: (r) => {
      setPreview(r.preview);
      setStatus(null);
    },
    onError: fail,
  });
  const commit = useMutation({
    mutationFn: () =>
      apiFetch<SpecImportCommitResponse>("/api/specs/import?step=commit", {
        method: "POST",
        body: { csv },
      }),
    onSuccess: async (r) => {
      setStatus(
        `Saved ${r.created} row${r.created === 1 ? "" : "s"}${r.leftOut ? `; ${r.leftOut} with problems left out` : ""}.`,
      );
      setPreview(null);
      await queryClient.invalidateQueries({ queryKey: specKeys.all });
    },
    onError: fail,
  });
  const good = preview?.rows.filter((r) => r.problems.length === 0).length ?? 0;

  return (
    <section aria-labelledby="import-heading" className="card space-y-3">
      <h2 id="import-heading" className="text-xl font-bold">
        Import from CSV
      </h2>
      <p className="text-ink-soft">
        Columns: year_from, year_to, make, model, variant, rear_ac, refrigerant, label_charge (g, or
        label_charge_oz), oil_type, total_oil. Nothing is saved until you have seen the preview.
      </p>
      <label htmlFor="spec-file" className="field-label">
        Choose a file
      </label>
      <input
        id="spec-file"
        type="file"
        accept=".csv,text/csv"
        className="block min-h-touch w-full max-w-full"
        onChange={async (e) => {
          const file = e.target.files?.[0];
          if (file) {
            setCsv(await file.text());
            setPreview(null);
          }
        }}
      />
      <label htmlFor="spec-csv" className="field-label">
        Or paste the CSV text
      </label>
      <textarea
        id="spec-csv"
        rows={5}
        className="field-input py-2 font-mono text-base"
        value={csv}
        onChange={(e) => {
          setCsv(e.target.value);
          setPreview(null);
        }}
      />
      <button
        type="button"
        className="btn-quiet w-full"
        disabled={!csv.trim() || check.isPending}
        onClick={() => check.mutate()}
      >
        {check.isPending ? "Reading…" : "Preview the import"}
      </button>
      {preview && (
        <div className="space-y-2" data-testid="import-preview">
          {preview.fileProblems.map((p) => (
            <p key={p} role="alert" className="field-error">
              {p}
            </p>
          ))}
          {preview.ignoredColumns.length > 0 && (
            <p className="text-ink-soft">Columns not used: {preview.ignoredColumns.join(", ")}.</p>
          )}
          <ul className="space-y-1">
            {preview.rows.map((r) => (
              <li
                key={r.line}
                className={clsx(
                  "rounded-card border-l-8 p-2",
                  r.problems.length ? "border-ember-500 bg-ember-50" : "border-sound-500 bg-sound-50",
                )}
              >
                <strong>Line {r.line}:</strong>{" "}
                {r.values
                  ? `${r.values.yearFrom}–${r.values.yearTo} ${r.values.make} ${r.values.model} ${r.values.variant} · ${r.values.labelChargeG} g`
                  : ""}
                {r.problems.length ? ` — ${r.problems.join("; ")}` : " — ready"}
                {r.warnings.length ? ` (note: ${r.warnings.join("; ")})` : ""}
              </li>
            ))}
          </ul>
          <button
            type="button"
            className="btn-primary w-full"
            disabled={good === 0 || preview.fileProblems.length > 0 || commit.isPending}
            onClick={() => commit.mutate()}
          >
            {commit.isPending ? "Saving…" : `Save ${good} row${good === 1 ? "" : "s"} without problems`}
          </button>
        </div>
      )}
      {status && (
        <p role="status" className="font-bold">
          {status}
        </p>
      )}
    </section>
  );
}
