"use client";

import { useState } from "react";
import type { CasebookFacet, CasebookFacetsResponse } from "@/lib/contracts/casebook";
import { withParams, type CasebookParams } from "@/lib/casebook/url";
import { FACET_TITLES, facetValueLabel } from "./labels";

const SELECT_FACETS: { facet: CasebookFacet; param: string }[] = [
  { facet: "cause", param: "cause" },
  { facet: "suspect", param: "suspect" },
  { facet: "refrigerant", param: "refrigerant" },
  { facet: "device", param: "device" },
  { facet: "compressor", param: "compressor" },
  { facet: "make", param: "make" },
  { facet: "model", param: "model" },
  { facet: "technician", param: "technician" },
  { facet: "status", param: "status" },
];

/** The facets: each value with how many of the search's cases have it; chosen ones show as chips. */
export function CasebookFilters({
  params,
  facets,
  onChange,
}: {
  params: CasebookParams;
  facets: CasebookFacetsResponse | undefined;
  onChange: (next: CasebookParams) => void;
}) {
  const symptoms = (params.symptoms ?? "").split(",").filter(Boolean);
  const set = (changes: CasebookParams) => onChange(withParams(params, changes));
  // The box ticks at once; the URL (and so `params`) follows when the router has moved, which takes a
  // moment on a slow phone. A tick remembered for one URL value is dropped when that value changes.
  const [comebackTick, setComebackTick] = useState<{ from: boolean; to: boolean } | null>(null);
  const comebackInUrl = Boolean(params.comeback);
  const comebackChecked =
    comebackTick && comebackTick.from === comebackInUrl ? comebackTick.to : comebackInUrl;
  const chips: { key: string; text: string; clear: CasebookParams }[] = [
    ...symptoms.map((s) => ({
      key: `symptom-${s}`,
      text: facetValueLabel("symptoms", s),
      clear: { symptoms: symptoms.filter((x) => x !== s).join(",") },
    })),
    ...SELECT_FACETS.filter(({ param }) => params[param]).map(({ facet, param }) => ({
      key: param,
      text: `${FACET_TITLES[facet]}: ${facetValueLabel(
        facet,
        params[param] ?? "",
        facets?.facets[facet].find((f) => f.value === params[param])?.label,
      )}`,
      clear: { [param]: "" },
    })),
    ...(params.yearFrom || params.yearTo
      ? [
          {
            key: "years",
            text: `Model years ${params.yearFrom ?? "…"}–${params.yearTo ?? "…"}`,
            clear: { yearFrom: "", yearTo: "" },
          },
        ]
      : []),
    ...(params.from || params.to
      ? [
          {
            key: "dates",
            text: `Opened ${params.from ?? "…"} to ${params.to ?? "…"}`,
            clear: { from: "", to: "" },
          },
        ]
      : []),
    ...(params.comeback ? [{ key: "comeback", text: "Comebacks only", clear: { comeback: "" } }] : []),
  ];

  return (
    <section aria-label="Filters" className="space-y-2">
      {chips.length > 0 && (
        <ul className="flex flex-wrap gap-2" aria-label="Filters in use">
          {chips.map((chip) => (
            <li key={chip.key}>
              <button
                type="button"
                className="btn-quiet min-h-touch px-3 py-1 text-base"
                onClick={() => set(chip.clear)}
                aria-label={`Remove filter ${chip.text}`}
              >
                {chip.text} <span aria-hidden="true">×</span>
              </button>
            </li>
          ))}
          <li>
            <button
              type="button"
              className="btn-quiet min-h-touch px-3 py-1 text-base"
              onClick={() => onChange(params.q ? { q: params.q } : {})}
            >
              Clear all filters
            </button>
          </li>
        </ul>
      )}
      <details className="card">
        <summary className="flex min-h-touch cursor-pointer items-center font-bold">
          Filters{chips.length > 0 ? ` (${chips.length} in use)` : ""}
        </summary>
        <div className="mt-3 grid grid-cols-1 gap-4 sm:grid-cols-2 lg:grid-cols-3 [&>*]:min-w-0">
          <div>
            <label htmlFor="facet-symptoms" className="field-label">
              {FACET_TITLES.symptoms}
            </label>
            <select
              id="facet-symptoms"
              className="field-input"
              value=""
              onChange={(e) => e.target.value && set({ symptoms: [...symptoms, e.target.value].join(",") })}
            >
              <option value="">Add a symptom…</option>
              {(facets?.facets.symptoms ?? [])
                .filter((f) => !symptoms.includes(f.value))
                .map((f) => (
                  <option key={f.value} value={f.value}>
                    {facetValueLabel("symptoms", f.value)} ({f.count})
                  </option>
                ))}
            </select>
          </div>
          {SELECT_FACETS.map(({ facet, param }) => {
            const values = facets?.facets[facet] ?? [];
            const current = params[param] ?? "";
            const listed = current === "" || values.some((v) => v.value === current);
            return (
              <div key={param}>
                <label htmlFor={`facet-${param}`} className="field-label">
                  {FACET_TITLES[facet]}
                </label>
                <select
                  id={`facet-${param}`}
                  className="field-input"
                  value={current}
                  onChange={(e) =>
                    set({ [param]: e.target.value, ...(param === "make" ? { model: "" } : {}) })
                  }
                >
                  <option value="">Any</option>
                  {!listed && <option value={current}>{facetValueLabel(facet, current)} (0)</option>}
                  {values.map((f) => (
                    <option key={f.value} value={f.value}>
                      {facetValueLabel(facet, f.value, f.label)} ({f.count})
                    </option>
                  ))}
                </select>
              </div>
            );
          })}
          <RangeFields
            legend="Model years"
            type="number"
            from={{ id: "facet-year-from", label: "From", value: params.yearFrom ?? "" }}
            to={{ id: "facet-year-to", label: "To", value: params.yearTo ?? "" }}
            onCommit={(from, to) => set({ yearFrom: from, yearTo: to })}
          />
          <RangeFields
            legend="Opened between"
            type="date"
            from={{ id: "facet-from", label: "From", value: params.from ?? "" }}
            to={{ id: "facet-to", label: "To", value: params.to ?? "" }}
            onCommit={(from, to) => set({ from, to })}
          />
          <label className="flex min-h-touch items-center gap-3 font-bold">
            <input
              type="checkbox"
              className="h-6 w-6"
              checked={comebackChecked}
              onChange={(e) => {
                setComebackTick({ from: comebackInUrl, to: e.target.checked });
                set({ comeback: e.target.checked ? "1" : "" });
              }}
            />
            Comebacks only
            {facets ? ` (${facets.facets.comeback[0]?.count ?? 0})` : ""}
          </label>
        </div>
      </details>
    </section>
  );
}

/** Two fields that apply together, when the second loses focus or Enter is pressed: typing is not searching. */
function RangeFields({
  legend,
  type,
  from,
  to,
  onCommit,
}: {
  legend: string;
  type: "number" | "date";
  from: { id: string; label: string; value: string };
  to: { id: string; label: string; value: string };
  onCommit: (from: string, to: string) => void;
}) {
  const [a, setA] = useState(from.value);
  const [b, setB] = useState(to.value);
  const [seen, setSeen] = useState({ a: from.value, b: to.value });
  if (seen.a !== from.value || seen.b !== to.value) {
    setSeen({ a: from.value, b: to.value });
    setA(from.value);
    setB(to.value);
  }
  const commit = () => {
    if (a !== from.value || b !== to.value) onCommit(a.trim(), b.trim());
  };
  const input = (f: { id: string; label: string }, value: string, setValue: (v: string) => void) => (
    <div className="min-w-0 flex-1">
      <label htmlFor={f.id} className="text-base">
        {f.label}
      </label>
      <input
        id={f.id}
        type={type}
        inputMode={type === "number" ? "numeric" : undefined}
        className="field-input"
        value={value}
        onChange={(e) => setValue(e.target.value)}
        onBlur={commit}
        onKeyDown={(e) => e.key === "Enter" && commit()}
      />
    </div>
  );
  return (
    <fieldset>
      <legend className="field-label">{legend}</legend>
      {/* A date field is too wide for two side by side on a phone: they stack there. */}
      <div className={type === "date" ? "flex flex-col gap-2 sm:flex-row" : "flex gap-2"}>
        {input(from, a, setA)}
        {input(to, b, setB)}
      </div>
    </fieldset>
  );
}
