"use client";

import { useEffect, useRef } from "react";
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

/** Where the strip should scroll so the current step sits in the middle of the visible part. */
function stripScrollLeftPx(strip: { widthPx: number }, item: { leftPx: number; widthPx: number }) {
  return Math.max(0, Math.round(item.leftPx - (strip.widthPx - item.widthPx) / 2));
}

export function ProgressStrip({
  entries,
  onOpen,
}: {
  entries: ProgressEntry[];
  onOpen: (step: StepId) => void;
}) {
  const listRef = useRef<HTMLOListElement>(null);
  const current = entries.find((e) => e.status === "current")?.step;

  // On a phone only two or three steps fit: keep the current one in view, without moving the page.
  useEffect(() => {
    const list = listRef.current;
    const item = list?.querySelector<HTMLElement>("[aria-current=step]")?.parentElement;
    if (!list || !item) return;
    const left = stripScrollLeftPx(
      { widthPx: list.clientWidth },
      { leftPx: item.offsetLeft, widthPx: item.offsetWidth },
    );
    if (typeof list.scrollTo === "function") list.scrollTo({ left, behavior: "auto" });
    else list.scrollLeft = left;
  }, [current, entries.length]);

  return (
    <nav aria-label="Interview steps">
      <ol ref={listRef} className="relative flex gap-1 overflow-x-auto pb-1" data-testid="step-strip">
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
