import { CAUSE_LABELS, formatMessage, type Message, type ReaderUnits, type Suspect } from "@/lib/diagnosis";

/** Findings stored before evidence became quantities hold plain sentences. */
export function evidenceText(item: Message | string, units?: ReaderUnits): string {
  return typeof item === "string" ? item : formatMessage(item, units);
}

/** Findings stored before shares held an independent score per cause. */
function shareOf(suspect: Suspect & { score?: number }): number {
  return suspect.share ?? suspect.score ?? 0;
}

/** One suspect: how strongly the readings point to it, and why — in both directions. */
export function SuspectCard({
  suspect,
  rank,
  units,
}: {
  suspect: Suspect;
  rank: number;
  units?: ReaderUnits;
}) {
  const assessed = suspect.assessed !== false;
  const pct = Math.round(shareOf(suspect) * 100);
  return (
    <article
      className="rounded-card border border-paper-line bg-paper p-3"
      aria-label={`${rank}. ${CAUSE_LABELS[suspect.cause]}`}
    >
      <div className="flex items-baseline justify-between gap-2">
        <h3 className="font-bold">
          {rank}. {CAUSE_LABELS[suspect.cause]}
        </h3>
        <span className="font-mono text-lg font-bold">{assessed ? `${pct} %` : "not assessed"}</span>
      </div>
      {assessed ? (
        <>
          <div className="mt-1 h-2 rounded-full bg-paper-sunk" aria-hidden>
            <div className="h-2 rounded-full bg-glacier-600" style={{ width: `${pct}%` }} />
          </div>
          <p className="mt-1 text-sm text-ink-soft">{pct} % of the likelihood across all causes</p>
        </>
      ) : (
        <p className="mt-1 text-sm text-ink-soft">
          Not assessed: readings taken on a mixed or contaminated charge say nothing about this cause.
        </p>
      )}
      {suspect.evidenceFor.length > 0 && (
        <>
          <h4 className="mt-2 text-sm font-bold uppercase tracking-wide text-ink-soft">For</h4>
          <ul className="list-disc pl-5">
            {suspect.evidenceFor.map((e, i) => (
              <li key={i}>{evidenceText(e, units)}</li>
            ))}
          </ul>
        </>
      )}
      {suspect.evidenceAgainst.length > 0 && (
        <>
          <h4 className="mt-2 text-sm font-bold uppercase tracking-wide text-ink-soft">Against</h4>
          <ul className="list-disc pl-5">
            {suspect.evidenceAgainst.map((e, i) => (
              <li key={i}>{evidenceText(e, units)}</li>
            ))}
          </ul>
        </>
      )}
    </article>
  );
}
