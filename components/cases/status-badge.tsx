import { clsx } from "clsx";
import { CASE_STATUS_LABELS, type CaseStatus } from "@/lib/cases/statuses";

const STYLES: Record<CaseStatus, string> = {
  draft: "border-ink-muted bg-paper-sunk text-ink",
  awaiting_signoff: "border-caution-500 bg-caution-50 text-caution-700",
  signed_off: "border-sound-500 bg-sound-50 text-sound-700",
  sent_back: "border-ember-500 bg-ember-50 text-ember-700",
  closed: "border-ink-soft bg-paper text-ink-soft",
};

export function StatusBadge({ status }: { status: CaseStatus }) {
  return (
    <span
      className={clsx(
        "inline-block whitespace-nowrap rounded-full border-2 px-2 py-0.5 text-sm font-bold",
        STYLES[status],
      )}
    >
      {CASE_STATUS_LABELS[status]}
    </span>
  );
}
