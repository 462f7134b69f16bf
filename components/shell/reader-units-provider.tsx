"use client";

import { createContext } from "react";
import type { ProfileResponse } from "@/lib/contracts/profile";

/** The signed-in person's profile and the shop's altitude, handed down once by the shop's layout. */
export interface ReaderSeed {
  profile: ProfileResponse | null;
  altitudeM: number;
}

export const ReaderUnitsContext = createContext<ReaderSeed>({ profile: null, altitudeM: 0 });

/**
 * The seed alone, for the shop's layout: a page that never says a quantity through useReaderUnits
 * (reader-units.tsx) does not load the profile query with it.
 */
export function ReaderUnitsProvider({
  profile,
  altitudeM,
  children,
}: ReaderSeed & { children: React.ReactNode }) {
  return <ReaderUnitsContext.Provider value={{ profile, altitudeM }}>{children}</ReaderUnitsContext.Provider>;
}
