"use client";

import { useEffect, useState } from "react";

// Which cautions this device has already shown in a case. A caution is shown open the first time it
// applies, and folded to one line on later steps, so the step's first field is in view on a phone.
const key = (caseId: number) => `chillwright:cautions-shown:${caseId}`;

function read(caseId: number): string[] {
  if (typeof window === "undefined") return [];
  try {
    const parsed: unknown = JSON.parse(window.localStorage.getItem(key(caseId)) ?? "[]");
    return Array.isArray(parsed) ? parsed.filter((id): id is string => typeof id === "string") : [];
  } catch {
    return [];
  }
}

/**
 * The ids shown before this step began (fold these), given the ids on screen now. A caution counts
 * as shown once a step opened with it on screen: one that appears while a reading is typed stays
 * open until a step has opened with it, so a new danger is never folded before it is read.
 */
export function useShownCautions(caseId: number, stepKey: string, onScreen: readonly string[]) {
  // The interview renders only in the browser (it waits for the device's outbox), so reading storage
  // while rendering matches what the server sent. Read again when the step changes.
  const [state, setState] = useState(() => ({ stepKey, ids: new Set(read(caseId)) }));
  if (state.stepKey !== stepKey) setState({ stepKey, ids: new Set(read(caseId)) });
  const onScreenKey = onScreen.join(" ");
  useEffect(() => {
    if (typeof window === "undefined" || onScreenKey === "") return;
    const all = new Set([...read(caseId), ...onScreenKey.split(" ")]);
    try {
      window.localStorage.setItem(key(caseId), JSON.stringify([...all]));
    } catch {
      // A full or blocked storage only means the cards stay open.
    }
    // Only on arriving at a step: what shows up while typing is remembered at the next arrival.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [caseId, stepKey]);
  return state.ids as ReadonlySet<string>;
}
