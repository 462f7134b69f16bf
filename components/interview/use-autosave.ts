"use client";

import { useCallback, useEffect, useRef, useState } from "react";
import type { InterviewSaveResponse } from "@/lib/contracts/interview";
import type { SavedInterview } from "@/machines/interview-view";
import { apiFetch, ApiError } from "@/lib/queries/api-fetch";
import { clearOutbox, writeOutbox } from "@/lib/queries/interview-outbox";
import { isTryAgainStatus, nextRetryDelayMs } from "@/lib/queries/retry-after";

export type SaveStatus =
  | { kind: "saved"; pending: 0 }
  | { kind: "saving"; pending: number }
  | { kind: "waiting"; pending: number; reason: "offline" | "retrying" }
  | { kind: "conflict"; pending: number; message: string }
  | { kind: "refused"; pending: number; message: string };

const DEBOUNCE_MS = 300;
const MAX_RETRY_MS = 15_000;

/**
 * Saves the interview within about a second of each answer. Every change is first written to
 * IndexedDB; the server copy follows when the network allows, in order, guarded by the case
 * version so another tab's or device's save is never silently overwritten.
 */
export function useAutosave({ caseId, initialVersion }: { caseId: number; initialVersion: number }) {
  const [status, setStatus] = useState<SaveStatus>({ kind: "saved", pending: 0 });
  const version = useRef(initialVersion);
  const latest = useRef<{ record: SavedInterview; json: string; pending: number } | null>(null);
  const lastSentJson = useRef<string | null>(null);
  const inFlight = useRef(false);
  const timer = useRef<ReturnType<typeof setTimeout> | undefined>(undefined);
  const retryMs = useRef(1000);
  const blocked = useRef(false);
  // Timers call the latest flush through this ref; flush schedules itself again on failure.
  const flushRef = useRef<() => Promise<void>>(async () => {});

  const flush = useCallback(async () => {
    clearTimeout(timer.current);
    const item = latest.current;
    if (!item || inFlight.current || blocked.current) return;
    if (typeof navigator !== "undefined" && !navigator.onLine) {
      setStatus({ kind: "waiting", pending: item.pending, reason: "offline" });
      return;
    }
    inFlight.current = true;
    setStatus({ kind: "saving", pending: item.pending });
    try {
      const result = await apiFetch<InterviewSaveResponse>(`/api/cases/${caseId}/interview`, {
        method: "PUT",
        body: { ...item.record, baseVersion: version.current },
      });
      version.current = result.version;
      lastSentJson.current = item.json;
      retryMs.current = 1000;
      if (latest.current?.json === item.json) {
        latest.current = null;
        await clearOutbox(caseId);
        setStatus({ kind: "saved", pending: 0 });
      } else if (latest.current) {
        latest.current.pending = Math.max(1, latest.current.pending - item.pending);
        await writeOutbox({
          caseId,
          record: latest.current.record,
          baseVersion: version.current,
          pendingChanges: latest.current.pending,
          savedAt: Date.now(),
        });
      }
    } catch (error) {
      const pending = latest.current?.pending ?? item.pending;
      if (error instanceof ApiError && error.status === 409) {
        blocked.current = true;
        setStatus({ kind: "conflict", pending, message: error.message });
      } else if (
        error instanceof ApiError &&
        error.status >= 400 &&
        error.status < 500 &&
        !isTryAgainStatus(error.status)
      ) {
        blocked.current = true;
        setStatus({ kind: "refused", pending, message: error.message });
      } else {
        // The network or the server is away or busy: keep the copy in IndexedDB and try again later,
        // no sooner than the server's Retry-After asked.
        const serverAskedMs = error instanceof ApiError ? error.retryAfterMs : undefined;
        setStatus({ kind: "waiting", pending, reason: navigator.onLine ? "retrying" : "offline" });
        timer.current = setTimeout(
          () => void flushRef.current(),
          nextRetryDelayMs(retryMs.current, serverAskedMs, MAX_RETRY_MS),
        );
        retryMs.current = Math.min(retryMs.current * 2, MAX_RETRY_MS);
      }
    } finally {
      inFlight.current = false;
    }
    if (latest.current && !blocked.current && latest.current.json !== lastSentJson.current) {
      timer.current = setTimeout(() => void flushRef.current(), DEBOUNCE_MS);
    }
  }, [caseId]);
  useEffect(() => {
    flushRef.current = flush;
  }, [flush]);

  const queue = useCallback(
    (record: SavedInterview, options: { pendingFromEarlier?: number } = {}) => {
      const json = JSON.stringify(record);
      if (json === (latest.current?.json ?? lastSentJson.current)) return;
      const pending = (latest.current?.pending ?? 0) + 1 + (options.pendingFromEarlier ?? 0);
      latest.current = { record, json, pending };
      void writeOutbox({
        caseId,
        record,
        baseVersion: version.current,
        pendingChanges: pending,
        savedAt: Date.now(),
      });
      setStatus((s) =>
        s.kind === "conflict" || s.kind === "refused"
          ? { ...s, pending }
          : s.kind === "waiting"
            ? { ...s, pending }
            : { kind: "saving", pending },
      );
      clearTimeout(timer.current);
      timer.current = setTimeout(() => void flush(), DEBOUNCE_MS);
    },
    [caseId, flush],
  );

  /** Marks the starting record as already on the server, so it is not sent again. */
  const markSaved = useCallback((record: SavedInterview) => {
    lastSentJson.current = JSON.stringify(record);
  }, []);

  useEffect(() => {
    const onOnline = () => {
      retryMs.current = 1000;
      void flush();
    };
    const onHidden = () => {
      if (document.visibilityState === "hidden") void flush();
    };
    window.addEventListener("online", onOnline);
    document.addEventListener("visibilitychange", onHidden);
    return () => {
      window.removeEventListener("online", onOnline);
      document.removeEventListener("visibilitychange", onHidden);
      clearTimeout(timer.current);
    };
  }, [flush]);

  return { status, queue, markSaved, flush, currentVersion: () => version.current };
}
