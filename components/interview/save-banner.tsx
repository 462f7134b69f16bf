"use client";

import type { SaveStatus } from "./use-autosave";

/** A quiet line that says what is waiting; louder only when the technician must act. */
export function SaveBanner({ status, onReload }: { status: SaveStatus; onReload: () => void }) {
  const plural = (n: number) => (n === 1 ? "1 change" : `${n} changes`);
  if (status.kind === "conflict" || status.kind === "refused") {
    return (
      <div role="alert" className="rounded-card border-2 border-ember-500 bg-ember-50 p-3 text-ember-700">
        <p className="font-bold">{status.message}</p>
        <p className="mt-1 text-sm">{plural(status.pending)} kept on this device, not lost.</p>
        {status.kind === "conflict" && (
          <button type="button" className="btn-quiet mt-2" onClick={onReload}>
            Reload the case
          </button>
        )}
      </div>
    );
  }
  const text =
    status.kind === "saved"
      ? "All answers saved"
      : status.kind === "saving"
        ? "Saving…"
        : status.reason === "offline"
          ? `No connection: ${plural(status.pending)} waiting on this device, sent when the network is back`
          : `Server not answering: ${plural(status.pending)} waiting on this device, trying again`;
  return (
    <p
      role="status"
      data-save-state={status.kind}
      className={
        status.kind === "waiting"
          ? "rounded-card bg-caution-50 px-3 py-2 font-bold text-caution-700"
          : "px-1 text-sm text-ink-soft"
      }
    >
      {text}
    </p>
  );
}
