"use client";

import { useEffect, useState } from "react";
import type { SavedInterview } from "@/machines/interview-view";
import { clearOutbox, readOutbox, type OutboxEntry } from "@/lib/queries/interview-outbox";
import { Interview, type InterviewProps } from "./interview";

type Boot =
  | { kind: "loading" }
  | { kind: "ready"; record: Partial<SavedInterview>; pending: number }
  | { kind: "choose"; local: OutboxEntry };

/**
 * Before the interview starts, look for answers this device typed but never got confirmed.
 * Based on the server's current version they simply continue; based on an older one, the
 * technician chooses, because someone else has saved the case since.
 */
export function InterviewBoot(
  props: Omit<InterviewProps, "record" | "pendingFromDevice"> & { serverRecord: Partial<SavedInterview> },
) {
  const { caseId, version, serverRecord } = props;
  const [boot, setBoot] = useState<Boot>({ kind: "loading" });

  useEffect(() => {
    let live = true;
    readOutbox(caseId)
      .catch(() => undefined)
      .then((local) => {
        if (!live) return;
        if (!local) setBoot({ kind: "ready", record: serverRecord, pending: 0 });
        else if (local.baseVersion === version)
          setBoot({ kind: "ready", record: local.record, pending: Math.max(1, local.pendingChanges) });
        else setBoot({ kind: "choose", local });
      });
    return () => {
      live = false;
    };
  }, [caseId, version, serverRecord]);

  if (boot.kind === "loading") return <p role="status">Opening the interview…</p>;
  if (boot.kind === "choose") {
    return (
      <div role="alert" className="card space-y-3">
        <h1 className="text-xl font-bold">Two versions of this interview</h1>
        <p>
          This device holds{" "}
          {boot.local.pendingChanges === 1 ? "1 change" : `${boot.local.pendingChanges} changes`} that never
          reached the server, and the case has been saved elsewhere since. Which answers should continue?
        </p>
        <div className="flex flex-wrap gap-2">
          <button
            type="button"
            className="btn-primary"
            onClick={() =>
              setBoot({
                kind: "ready",
                record: boot.local.record,
                pending: Math.max(1, boot.local.pendingChanges),
              })
            }
          >
            Keep this device&apos;s answers
          </button>
          <button
            type="button"
            className="btn-quiet"
            onClick={async () => {
              await clearOutbox(caseId);
              setBoot({ kind: "ready", record: serverRecord, pending: 0 });
            }}
          >
            Use the saved answers
          </button>
        </div>
      </div>
    );
  }
  return <Interview {...props} record={boot.record} pendingFromDevice={boot.pending} />;
}
