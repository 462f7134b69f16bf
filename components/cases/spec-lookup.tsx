"use client";

import { useState } from "react";
import { useQuery } from "@tanstack/react-query";
import type { SpecEntryDto } from "@/lib/contracts/specs";
import { specsQuery } from "@/lib/queries/specs";

export interface SpecLookupPick {
  year?: number;
  make: string;
  model: string;
  refrigerant: string;
  labelChargeG: number;
}

/** The model year to fill: one the technician typed among the words, else the row's only year. */
export function yearFromLookup(words: string, row: Pick<SpecEntryDto, "yearFrom" | "yearTo">) {
  const typed = words
    .split(/\s+/)
    .filter((w) => /^\d{4}$/.test(w))
    .map(Number)
    .find((y) => y >= row.yearFrom && y <= row.yearTo);
  return typed ?? (row.yearFrom === row.yearTo ? row.yearFrom : undefined);
}

function describe(r: SpecEntryDto) {
  const years = r.yearFrom === r.yearTo ? `${r.yearFrom}` : `${r.yearFrom}–${r.yearTo}`;
  return `${r.make} ${r.model}${r.variant ? ` ${r.variant}` : ""}, ${years}`;
}

/**
 * A new vehicle from the shop's spec table: a year and a word of the model find the row, and one
 * tap fills the make, model, year, refrigerant and label charge (the label on the car still wins).
 */
export function SpecLookup({ onPick }: { onPick: (pick: SpecLookupPick) => void }) {
  const [words, setWords] = useState("");
  const searching =
    words
      .trim()
      .replace(/\b\d{4}\b/g, "")
      .trim().length >= 2;
  const { data: rows = [] } = useQuery({ ...specsQuery(words.trim()), enabled: searching });
  return (
    <div className="sm:col-span-2">
      <label htmlFor="nv-spec-lookup" className="field-label">
        Look up in the spec table (year and model)
      </label>
      <input
        id="nv-spec-lookup"
        type="search"
        className="field-input"
        value={words}
        onChange={(e) => setWords(e.target.value)}
        autoComplete="off"
      />
      {searching && (
        <ul className="mt-2 space-y-2" aria-label="Spec table rows">
          {rows.slice(0, 4).map((r) => (
            <li key={r.id}>
              <button
                type="button"
                className="min-h-touch w-full rounded-card border-2 border-glacier-500 bg-glacier-50 p-2 text-left"
                onClick={() =>
                  onPick({
                    year: yearFromLookup(words, r),
                    make: r.make,
                    model: r.model,
                    refrigerant: r.refrigerant,
                    labelChargeG: r.labelChargeG,
                  })
                }
              >
                <span className="block font-bold">{describe(r)}</span>
                <span className="block text-sm">
                  {r.refrigerant} · label {r.labelChargeG} g ·{" "}
                  {r.rearAc ? "front and rear A/C" : "front A/C only"}
                </span>
              </button>
            </li>
          ))}
          {rows.length === 0 && <li className="text-ink-soft">No row in the spec table matches.</li>}
        </ul>
      )}
    </div>
  );
}
