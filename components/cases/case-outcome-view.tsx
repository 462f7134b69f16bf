import type { CaseOutcomeView } from "@/lib/contracts/case-outcome";
import { confirmedCauseLabel } from "@/lib/casebook/labels";
import { REPAIR_CATALOG } from "@/lib/repairs/catalog";

/** What the repair confirmed and what was done, on a closed case. */
export function CaseOutcomeSummary({
  outcome,
  closedWhen,
}: {
  outcome: CaseOutcomeView;
  closedWhen: string | null;
}) {
  return (
    <section className="card space-y-2" aria-labelledby="outcome-heading">
      <h2 id="outcome-heading" className="text-lg font-bold">
        Outcome{closedWhen ? `, closed ${closedWhen}` : ""}
      </h2>
      <h3 className="font-bold">Confirmed cause</h3>
      <ul className="list-disc pl-6" data-testid="confirmed-causes">
        {outcome.causes.map((c) => (
          <li key={c}>{confirmedCauseLabel(c)}</li>
        ))}
      </ul>
      <h3 className="font-bold">Repair done</h3>
      {outcome.repairIds.length > 0 ? (
        <ul className="list-disc pl-6" data-testid="repairs-done">
          {outcome.repairIds.map((r) => (
            <li key={r}>{REPAIR_CATALOG[r]?.tradeLabel ?? r}</li>
          ))}
        </ul>
      ) : (
        <p>None recorded.</p>
      )}
      {outcome.note && (
        <>
          <h3 className="font-bold">Note</h3>
          <p className="whitespace-pre-line">{outcome.note}</p>
        </>
      )}
    </section>
  );
}

/** Each close and reopen, with who and when, and a reopen's reason. */
export function CaseOutcomeHistory({
  events,
}: {
  events: (CaseOutcomeView["history"][number] & { when: string })[];
}) {
  if (events.length === 0) return null;
  const verb = { close: "Closed", outcome_corrected: "Outcome corrected", reopen: "Reopened" } as const;
  return (
    <section className="card" aria-labelledby="outcome-history-heading">
      <h2 id="outcome-history-heading" className="text-lg font-bold">
        Closed and reopened
      </h2>
      <ul className="mt-2 space-y-2" data-testid="outcome-history">
        {events.map((e, i) => (
          <li key={i}>
            <span className="font-bold">{verb[e.action]}</span> by {e.by ?? "someone no longer listed"},{" "}
            {e.when}
            {e.reason ? `: “${e.reason}”` : ""}
          </li>
        ))}
      </ul>
    </section>
  );
}
