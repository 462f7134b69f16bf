"use client";

import { CAUSE_LABELS, type CauseId, type Suspect } from "@/lib/diagnosis";
import { SuspectCard } from "@/components/interview/suspect-card";
import { DetailsLine } from "@/components/ui/details-line";
import { useReaderUnits } from "@/components/shell/reader-units";

interface Snapshot {
  engineVersion: string;
  suspects: Suspect[];
  /** absent on findings stored before the engine stated what was measured */
  measured?: { statement: string };
  nextCheck?: { instruction: string };
}

/** The findings exactly as the technician was shown them when the case was submitted. */
export function FindingsSnapshot({
  findings,
  conclusionCause,
  conclusionNotes,
}: {
  findings: Snapshot;
  conclusionCause: string | null;
  conclusionNotes: string | null;
}) {
  const { units } = useReaderUnits();
  const top = findings.suspects[0];
  const differs = conclusionCause && top && top.cause !== conclusionCause;
  return (
    <section aria-labelledby="snapshot-heading" className="card space-y-3">
      <h2 id="snapshot-heading" className="text-lg font-bold">
        Findings shown at submission
      </h2>
      {conclusionCause && (
        <p>
          <strong>Conclusion:</strong> {CAUSE_LABELS[conclusionCause as CauseId] ?? conclusionCause}
          {differs && (
            <span className="ml-1 font-bold text-caution-700">(differs from the leading suspect)</span>
          )}
        </p>
      )}
      {conclusionNotes && <p className="italic">&ldquo;{conclusionNotes}&rdquo;</p>}
      {findings.measured && <p className="text-ink-soft">{findings.measured.statement}</p>}
      <ol className="space-y-2">
        {findings.suspects.slice(0, 3).map((s, i) => (
          <li key={s.cause}>
            <SuspectCard suspect={s} rank={i + 1} units={units} />
          </li>
        ))}
      </ol>
      {findings.nextCheck && (
        <p>
          <strong>Next check then:</strong> {findings.nextCheck.instruction}
        </p>
      )}
      <DetailsLine>
        <p>Worked out by findings engine version {findings.engineVersion}.</p>
      </DetailsLine>
    </section>
  );
}
