"use client";

import { useContext, useMemo } from "react";
import { useQuery } from "@tanstack/react-query";
import { profileQuery } from "@/lib/queries/profile";
import type { BarometricSource } from "@/lib/units/barometric";
import { formatQuantity, type Quantity, sayInUnits, SI_READER_UNITS } from "@/lib/units/quantity";
import type { ReaderUnits } from "@/lib/units/reader";
import { ReaderUnitsContext } from "./reader-units-provider";

export interface ReaderUnitsView {
  units: ReaderUnits;
  /** How the reader writes numbers, when they chose a locale. */
  locale: string | null;
  /** Where a vacuum is read: the shop's altitude. */
  at: BarometricSource;
  /** One quantity in the reader's units. */
  format: (q: Quantity) => string;
  /** A sentence with quantity markers, said in the reader's units. */
  say: (text: string) => string;
}

/**
 * The reader's units for any client component: seeded from the layout (no fetch on the page), kept
 * in the profile query so a change saved on the profile screen shows everywhere at once.
 */
export function useReaderUnits(): ReaderUnitsView {
  const seed = useContext(ReaderUnitsContext);
  const { data } = useQuery({
    ...profileQuery(),
    ...(seed.profile ? { initialData: seed.profile } : {}),
    enabled: seed.profile !== null,
  });
  const units = data?.units ?? SI_READER_UNITS;
  const locale = data?.locale ?? null;
  const { altitudeM } = seed;
  return useMemo(() => {
    const at = { altitudeM };
    return {
      units,
      locale,
      at,
      format: (q: Quantity) => formatQuantity(q, units, at),
      say: (text: string) => sayInUnits(text, units, at),
    };
  }, [units, locale, altitudeM]);
}

/** A sentence with quantity markers, said in the reader's units; usable from server components. */
export function SaidInReaderUnits({ text }: { text: string }) {
  const { say } = useReaderUnits();
  return <>{say(text)}</>;
}
