import {
  CAUSE_IDS,
  CAUSE_TITLES,
  type FirstScreenRanking,
  type ReaderUnits,
  type Suspect,
} from "@/lib/diagnosis";
import { ChevronDown } from "lucide-react";
import { SuspectCard } from "./suspect-card";

function restLine(ranking: FirstScreenRanking<Suspect>): string {
  const n = ranking.others.length;
  const causes = n === 1 ? "1 other cause" : `${n} other causes`;
  return ranking.othersAssessed ? `${causes} together` : `${causes}, not assessed on this charge`;
}

/** A whole percent as the ranking shows it: the figure, then the sign kept on its line. */
function Percent({ percent, className }: { percent: number; className: string }) {
  return (
    <span className={`shrink-0 font-bold ${className}`} data-testid="share">
      <span className="font-mono">{percent}</span>
      {"\u00a0%"}
    </span>
  );
}

/**
 * The leading causes, one number each (their share of the likelihood, in whole percent), and one line
 * for the rest that opens on tap; the numbers shown add up to 100. Compact, so the next check still
 * fits on a phone's first screen under it.
 */
export function FindingsRanking({
  ranking,
  units,
}: {
  ranking: FirstScreenRanking<Suspect>;
  units?: ReaderUnits;
}) {
  return (
    <section
      aria-labelledby="suspects-heading"
      className="overflow-hidden rounded-card border-2 border-glacier-700 bg-paper"
    >
      <div className="flex items-baseline justify-between gap-2 bg-glacier-700 px-3 py-0.5 text-white">
        <h2 id="suspects-heading" className="text-base font-bold">
          Likely causes
        </h2>
        <p className="text-sm">share of the likelihood</p>
      </div>
      <ol className="divide-y divide-paper-line" data-testid="leading-causes">
        {ranking.leading.map(({ suspect, percent }, i) => (
          <li key={suspect.cause} className="relative" data-testid="leading-cause">
            {/* The share as a fill behind the row, so the bar costs no height. */}
            <div
              aria-hidden
              className="absolute inset-y-0 left-0 bg-glacier-100"
              style={{ width: `${percent}%` }}
            />
            <div className="relative flex items-center justify-between gap-3 px-3 py-1">
              <span className="font-bold leading-snug">
                {i + 1}. {CAUSE_TITLES[suspect.cause] ?? suspect.cause}
              </span>
              <Percent percent={percent} className="text-xl text-glacier-900" />
            </div>
          </li>
        ))}
      </ol>
      {ranking.others.length > 0 && (
        <details className="group border-t border-paper-line bg-paper-sunk" data-testid="other-causes">
          <summary className="flex min-h-touch cursor-pointer items-center justify-between gap-3 px-3 font-bold">
            <span className="flex items-center gap-1">
              <ChevronDown
                aria-hidden
                className="h-5 w-5 shrink-0 transition-transform group-open:rotate-180"
              />
              {restLine(ranking)}
            </span>
            {ranking.othersAssessed && <Percent percent={ranking.restPercent} className="text-lg" />}
          </summary>
          <div className="space-y-2 px-3 pb-3">
            <p className="text-sm text-ink-soft">
              {ranking.othersAssessed
                ? `Each number is that cause's share of the likelihood across all ${CAUSE_IDS.length} causes; with the causes above they make 100 %.`
                : "The refrigerant failed identification: these causes cannot be judged until the system holds a known, pure charge."}
            </p>
            <ol className="space-y-2" start={ranking.leading.length + 1}>
              {ranking.others.map(({ suspect, percent }, i) => (
                <li key={suspect.cause}>
                  <SuspectCard
                    suspect={suspect}
                    rank={ranking.leading.length + i + 1}
                    units={units}
                    percent={percent}
                  />
                </li>
              ))}
            </ol>
          </div>
        </details>
      )}
    </section>
  );
}
