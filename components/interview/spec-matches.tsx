"use client";

import { useState } from "react";
import { useQuery } from "@tanstack/react-query";
import { clsx } from "clsx";
import type { SpecMatchDto } from "@/lib/contracts/specs";
import { specMatchesQuery } from "@/lib/queries/spec-matches";
import { COMPRESSOR_TYPE_LABELS } from "@/lib/vehicles/compressor-types";
import { Providers } from "@/components/providers";

export interface SpecPick {
  refrigerant?: string;
  labelChargeG?: number;
  oilType?: string;
  compressorType?: string;
}

const OIL_FAMILIES = ["pag", "poe", "pao", "mineral"] as const;

/** The spec-table oil name ("PAG 46", "POE (dielectric)") as the interview's oil choice. */
function oilChoice(oilType: string | null | undefined): string | undefined {
  if (!oilType) return undefined;
  const lower = oilType.toLowerCase();
  return OIL_FAMILIES.find((family) => lower.includes(family)) ?? "other";
}

function describe(match: SpecMatchDto): string {
  const r = match.row;
  const years = r.yearFrom === r.yearTo ? `${r.yearFrom}` : `${r.yearFrom}–${r.yearTo}`;
  return `${years} ${r.make} ${r.model}${r.variant ? ` ${r.variant}` : ""}, ${r.rearAc ? "front and rear A/C" : "front A/C only"}`;
}

/**
 * Rows of the shop's spec table that fit this vehicle. Variants matter (the same model carries
 * different charges with and without rear A/C), so the technician picks the one that applies.
 */
export function SpecMatches({ vehicleId, onPick }: { vehicleId: number; onPick: (pick: SpecPick) => void }) {
  const { data: matches, isError } = useQuery(specMatchesQuery(vehicleId));
  const [picked, setPicked] = useState<number | null>(null);
  if (isError || !matches || matches.length === 0) return null;
  return (
    <section
      aria-labelledby="spec-matches-heading"
      className="rounded-card border-2 border-glacier-500 bg-glacier-50 p-3"
    >
      <h2 id="spec-matches-heading" className="font-bold">
        From the shop&apos;s spec table
      </h2>
      <p className="text-sm text-ink-soft">
        Check the under-hood label and pick the row that applies to this vehicle.
      </p>
      <ul className="mt-2 space-y-2">
        {matches.slice(0, 4).map((match) => (
          <li key={match.row.id}>
            <button
              type="button"
              aria-pressed={picked === match.row.id}
              onClick={() => {
                setPicked(match.row.id);
                onPick({
                  refrigerant: match.row.refrigerant,
                  labelChargeG: match.row.labelChargeG,
                  oilType: oilChoice(match.row.oilType),
                  ...(match.row.compressorType ? { compressorType: match.row.compressorType } : {}),
                });
              }}
              className={clsx(
                "min-h-glove w-full rounded-card border-2 p-2 text-left",
                picked === match.row.id
                  ? "border-glacier-700 bg-glacier-700 text-white"
                  : "border-ink-muted bg-paper",
              )}
            >
              <span className="block font-bold">{describe(match)}</span>
              <span className="block">
                {match.row.refrigerant} · {match.row.labelChargeG} g
                {match.row.oilType ? ` · ${match.row.oilType}` : ""}
                {match.row.totalOilMl ? ` · ${match.row.totalOilMl} mL oil in total` : ""}
                {match.row.compressorType
                  ? ` · ${COMPRESSOR_TYPE_LABELS[match.row.compressorType].toLowerCase()}`
                  : ""}
              </span>
            </button>
          </li>
        ))}
      </ul>
    </section>
  );
}

/** The matches inside TanStack Query's client, which the interview's first load does not carry. */
export function SpecMatchesWithQueries(props: { vehicleId: number; onPick: (pick: SpecPick) => void }) {
  return (
    <Providers>
      <SpecMatches {...props} />
    </Providers>
  );
}
