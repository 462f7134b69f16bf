import {
  CAUSE_LABELS,
  formatMessage,
  strongestReasons,
  type Message,
  type ReaderUnits,
  type Suspect,
} from "@/lib/diagnosis";

/** Findings stored before evidence became quantities hold plain sentences. */
export function evidenceText(item: Message | string, units?: ReaderUnits): string {
  return typeof item === "string" ? item : formatMessage(item, units);
}

/** Findings stored before shares held an independent score per cause. */
function shareOf(suspect: Suspect & { score?: number }): number {
  return suspect.share ?? suspect.score ?? 0;
}

/** The share as shown: "under 1 %" rather than a bare 0 for a cause that still holds some. */
export function percentText(percent: number, share: number): string {
  return percent === 0 && share > 0 ? "under 1 %" : `${percent} %`;
}

function ReasonList({
  side,
  items,
  units,
}: {
  side: "for" | "against";
  items: readonly (Message | string)[];
  units?: ReaderUnits;
}) {
  if (items.length === 0) return null;
  return (
    <ul className="space-y-1">
      {items.map((e, i) => (
        <li key={i} className="flex gap-2">
          <span
            aria-hidden
            className={
              side === "for"
                ? "mt-1 h-3 w-3 shrink-0 rounded-sm bg-glacier-600"
                : "mt-1 h-3 w-3 shrink-0 rounded-sm border-2 border-ink-muted"
            }
          />
          <span>{evidenceText(e, units)}</span>
        </li>
      ))}
    </ul>
  );
}

/**
 * One suspect and why: its strongest reasons for and against (lib/diagnosis/first-screen.ts), the rest
 * behind one line. `percent` is the share as the ranking shows it; null shows no number at all (the
 * ranking above already gave it); left out, the card rounds the stored share itself.
 */
export function SuspectCard({
  suspect,
  rank,
  units,
  percent,
}: {
  suspect: Suspect;
  rank: number;
  units?: ReaderUnits;
  percent?: number | null;
}) {
  const assessed = suspect.assessed !== false;
  const share = shareOf(suspect);
  const shown = percent === undefined ? Math.round(share * 100) : percent;
  const reasons = strongestReasons<Message | string>(suspect);
  const more = reasons.moreFor.length + reasons.moreAgainst.length;
  const label = CAUSE_LABELS[suspect.cause] ?? suspect.cause;
  return (
    <article className="rounded-card border border-paper-line bg-paper p-3" aria-label={`${rank}. ${label}`}>
      <div className="flex items-baseline justify-between gap-3">
        <h3 className="font-bold">
          {rank}. {label}
        </h3>
        {assessed && shown !== null && (
          <span className="shrink-0 text-lg font-bold">
            {shown === 0 && share > 0 ? (
              percentText(shown, share)
            ) : (
              <>
                <span className="font-mono">{shown}</span>
                {"\u00a0%"}
              </>
            )}
          </span>
        )}
      </div>
      {!assessed ? (
        <p className="mt-1 text-sm text-ink-soft">
          Not assessed: readings taken on a mixed or contaminated charge say nothing about this cause.
        </p>
      ) : (
        <>
          {reasons.for.length > 0 && (
            <div className="mt-2">
              <h4 className="text-sm font-bold text-glacier-700">For</h4>
              <ReasonList side="for" items={reasons.for} units={units} />
            </div>
          )}
          {reasons.against.length > 0 && (
            <div className="mt-2">
              <h4 className="text-sm font-bold text-ink-soft">Against</h4>
              <ReasonList side="against" items={reasons.against} units={units} />
            </div>
          )}
          {reasons.for.length === 0 && reasons.against.length === 0 && (
            <p className="mt-1 text-sm text-ink-soft">
              No reading spoke for or against it: its share is how common it is.
            </p>
          )}
          {more > 0 && (
            <details className="mt-2 text-sm">
              <summary className="inline-flex min-h-touch cursor-pointer items-center font-bold text-glacier-700">
                {more === 1 ? "1 weaker reason" : `${more} weaker reasons`}
              </summary>
              <div className="space-y-2 pb-1">
                {reasons.moreFor.length > 0 && (
                  <div>
                    <p className="font-bold text-glacier-700">For</p>
                    <ReasonList side="for" items={reasons.moreFor} units={units} />
                  </div>
                )}
                {reasons.moreAgainst.length > 0 && (
                  <div>
                    <p className="font-bold text-ink-soft">Against</p>
                    <ReasonList side="against" items={reasons.moreAgainst} units={units} />
                  </div>
                )}
              </div>
            </details>
          )}
        </>
      )}
    </article>
  );
}
