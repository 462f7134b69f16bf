"use client";

import type { AttentionItem } from "./attention";
import type { SaveStatus } from "./use-autosave";

/**
 * A quiet line that says what is waiting; louder only when the technician must act. It never says
 * "all answers saved" while an answer needs fixing or is still being typed: it names that answer.
 */
export function SaveBanner({
  status,
  attention = [],
  onReload,
}: {
  status: SaveStatus;
  attention?: AttentionItem[];
  onReload: () => void;
}) {
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
  const problems = attention.filter((a) => a.message !== undefined);
  if (status.kind === "saved" && problems.length > 0) {
    return (
      <div
        role="status"
        data-save-state="attention"
        className="rounded-card bg-caution-50 px-3 py-2 text-caution-700"
      >
        <p className="font-bold">
          {problems.length === 1 ? "One answer needs attention" : `${problems.length} answers need attention`}
          ; the last valid {problems.length === 1 ? "answer is" : "answers are"} kept:
        </p>
        <ul className="mt-1 list-disc pl-5 text-sm">
          {problems.map((p) => (
            <li key={`${p.group}-${p.label}`}>
              <span className="font-bold">{p.label}</span>: {p.message}
            </li>
          ))}
        </ul>
      </div>
    );
  }
  const typing = attention.filter((a) => a.message === undefined).map((a) => a.label);
  const text =
    status.kind === "saved"
      ? typing.length > 0
        ? `Saved as typed. ${typing.join(", ")}: becomes the answer when you leave the field or tap Next`
        : "All answers saved"
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
