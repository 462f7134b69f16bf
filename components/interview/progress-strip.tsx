"use client";

import { clsx } from "clsx";
import type { ProgressEntry } from "@/lib/interview/progress";
import { STEP_LABELS, type StepId } from "@/lib/interview/steps";

const MARK: Record<ProgressEntry["status"], string> = {
  current: "now",
  answered: "done",
  skipped: "skipped",
  needs_fixing: "check",
  open: "",
  ahead: "",
};

export function ProgressStrip({
  entries,
  onOpen,
}: {
  entries: ProgressEntry[];
  onOpen: (step: StepId) => void;
}) {
  return (
    <nav aria-label="Interview steps">
      <ol className="flex gap-1 overflow-x-auto pb-1">
        {entries.map((entry, index) => (
          <li key={entry.step} className="shrink-0">
            <button
              type="button"
              disabled={!entry.canOpen || entry.status === "current"}
              aria-current={entry.status === "current" ? "step" : undefined}
              onClick={() => onOpen(entry.step)}
              className={clsx(
                "flex min-h-touch max-w-[9rem] flex-col items-start rounded-card border-2 px-2 py-1 text-left text-sm leading-tight",
                entry.status === "current" && "border-glacier-700 bg-glacier-700 text-white",
                entry.status === "answered" && "border-glacier-500 bg-glacier-50 text-glacier-900",
                entry.status === "needs_fixing" && "border-ember-500 bg-ember-50 text-ember-700",
                entry.status === "skipped" && "border-dashed border-ink-muted bg-paper text-ink-soft",
                (entry.status === "open" || entry.status === "ahead") &&
                  "border-paper-line bg-paper text-ink-soft",
              )}
            >
              <span className="font-bold">
                {index + 1}. {STEP_LABELS[entry.step]}
              </span>
              {MARK[entry.status] && <span className="text-xs">{MARK[entry.status]}</span>}
            </button>
          </li>
        ))}
      </ol>
    </nav>
  );
}
