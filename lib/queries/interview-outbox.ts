import { createStore, del, get, set, type UseStore } from "idb-keyval";
import type { SavedInterview } from "@/lib/interview/saved";

/**
 * The browser's copy of an interview that the server has not confirmed yet. It lives in
 * IndexedDB, so a dead network, a closed tab or a reload never loses what was typed.
 */
export interface OutboxEntry {
  caseId: number;
  record: SavedInterview;
  /** The case version this record was based on: the last version the server confirmed to this device. */
  baseVersion: number;
  /** How many answers changed since the last confirmed save. */
  pendingChanges: number;
  savedAt: number;
}

let store: UseStore | undefined;
function outbox(): UseStore | undefined {
  if (typeof indexedDB === "undefined") return undefined;
  store ??= createStore("chillwright", "interview-outbox");
  return store;
}

const key = (caseId: number) => `case:${caseId}`;

export async function readOutbox(caseId: number): Promise<OutboxEntry | undefined> {
  const s = outbox();
  return s ? get<OutboxEntry>(key(caseId), s) : undefined;
}

export async function writeOutbox(entry: OutboxEntry): Promise<void> {
  const s = outbox();
  if (s) await set(key(entry.caseId), entry, s);
}

export async function clearOutbox(caseId: number): Promise<void> {
  const s = outbox();
  if (s) await del(key(caseId), s);
}
