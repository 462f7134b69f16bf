"use client";

import { useEffect, useMemo, useRef, useState } from "react";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useMutation } from "@tanstack/react-query";
import {
  CAUSE_IDS,
  CAUSE_LABELS,
  diagnose,
  formatMessage,
  type CauseId,
  type DiagnosisInput,
  type ReaderUnits,
} from "@/lib/diagnosis";
import type { Caution as InterviewCaution } from "@/lib/interview/cautions";
import { ApiError } from "@/lib/queries/api-fetch";
import { submitCase, type CaseSubmitResult } from "@/lib/queries/case-submit";
import { CautionsList, type CautionItem } from "@/components/cautions/cautions-list";
import { SuspectCard } from "./suspect-card";
import { ReviewThread, type ReviewContext } from "./review-thread";
import { clsx } from "clsx";
import {
  CONCLUSION_REASON_IDS,
  CONCLUSION_REASON_LABELS,
  conclusionProblem,
  type ConclusionReasonId,
} from "@/lib/cases/conclusion";
import type { SaveStatus } from "./use-autosave";
import { DetailsLine } from "@/components/ui/details-line";

interface Props {
  caseId: number;
  input: DiagnosisInput | null;
  /** The technician's units: every number in the findings is shown in them. */
  units?: ReaderUnits;
  interviewCautions: InterviewCaution[];
  /** whether submitting sends the case to a senior (lib/cases/rules.ts) rather than signing it off */
  waitsForSignOff: boolean;
  /** The review so far; a resubmission starts from the conclusion sent before. */
  review?: ReviewContext;
  /** Cautions already shown open earlier in this case: folded to one line here. */
  shownEarlier?: ReadonlySet<string>;
  saveStatus: SaveStatus;
  currentVersion: () => number;
  onBack: () => void;
}

export function FindingsStep({
  caseId,
  input,
  units,
  interviewCautions,
  waitsForSignOff,
  review,
  shownEarlier,
  saveStatus,
  currentVersion,
  onBack,
}: Props) {
  const router = useRouter();
  const onScreen = useMemo(() => (input ? diagnose(input) : null), [input]);
  const earlierCause = (CAUSE_IDS as readonly string[]).includes(review?.earlierCause ?? "")
    ? (review!.earlierCause as CauseId)
    : "";
  const [cause, setCause] = useState<CauseId | "">(earlierCause);
  const [notes, setNotes] = useState(review?.earlierNotes ?? "");
  const [reasons, setReasons] = useState<ConclusionReasonId[]>([]);
  const [error, setError] = useState<string | null>(null);
  // Set when the server's findings differ from these (the app was updated while the interview was open).
  const [stored, setStored] = useState<Extract<CaseSubmitResult, { findingsChanged: true }> | null>(null);
  const noteRef = useRef<HTMLDivElement>(null);
  useEffect(() => {
    if (stored) noteRef.current?.focus();
  }, [stored]);
  const mutation = useMutation({
    mutationFn: (body: Parameters<typeof submitCase>[1]) => submitCase(caseId, body),
    onSuccess: (result, sent) => {
      // Pin the conclusion that was sent: the default follows the leader, which the new findings may move.
      setCause(sent.conclusionCause);
      if (result.findingsChanged) return setStored(result);
      router.push(`/cases/${caseId}`);
      router.refresh();
    },
    onError: (e) =>
      setError(
        e instanceof ApiError
          ? (Object.values(e.fieldErrors ?? {})[0]?.[0] ?? e.message)
          : "No answer from the server; nothing is lost. Try again.",
      ),
  });
  const findings = stored?.findings ?? onScreen;

  if (!findings) {
    return (
      <div className="space-y-3">
        <p>
          The findings need the refrigerant, the expansion device and the air temperature. Go back and fill
          those in.
        </p>
        <button type="button" className="btn-quiet" onClick={onBack}>
          Back
        </button>
      </div>
    );
  }

  const chosen = cause || findings.suspects[0]?.cause || "";
  // The engine's cautions are the catalogue's (a repair in its conditional wording): one caution, one level.
  const cautions: CautionItem[] = [...interviewCautions];
  for (const c of findings.cautions) if (!cautions.some((x) => x.id === c.id)) cautions.push(c);

  function submit(event: React.FormEvent) {
    event.preventDefault();
    setError(null);
    if (saveStatus.kind !== "saved")
      return setError("Some answers are still waiting to be saved. Submit once they are.");
    if (!findings || !chosen) return;
    const problem = conclusionProblem({ needsReason: waitsForSignOff, reasons, words: notes });
    if (problem) return setError(problem);
    mutation.mutate({
      baseVersion: currentVersion(),
      engineVersion: findings.engineVersion,
      conclusionCause: chosen,
      conclusionNotes: notes,
      conclusionReasons: reasons,
    });
  }

  return (
    <div className="space-y-5">
      {stored && (
        <div
          ref={noteRef}
          tabIndex={-1}
          role="status"
          className="space-y-2 rounded-card border-2 border-glacier-600 bg-glacier-50 p-4"
          data-testid="findings-updated"
        >
          <p className="font-bold">
            {stored.status === "awaiting_signoff" ? "Sent to a senior for sign-off." : "Diagnosis submitted."}
          </p>
          <p>
            Chillwright was updated while this interview was open, so the findings were worked out again with
            the current version. The findings below are the ones stored with the case. Your conclusion is kept
            as you chose it.
          </p>
          <Link href={`/cases/${caseId}`} className="btn-primary">
            Open the case
          </Link>
        </div>
      )}
      <section aria-labelledby="suspects-heading">
        <h2 id="suspects-heading" className="text-xl font-bold">
          Likely causes
        </h2>
        <p className="mt-1 text-ink-soft" data-testid="measured">
          {findings.measured.statement}
        </p>
        <ol className="mt-2 space-y-3">
          {findings.suspects.slice(0, 4).map((s, i) => (
            <li key={s.cause}>
              <SuspectCard suspect={s} rank={i + 1} units={units} />
            </li>
          ))}
        </ol>
        {findings.suspects.length > 4 && (
          <details className="mt-3">
            <summary className="min-h-touch cursor-pointer font-bold">
              The other {findings.suspects.length - 4} causes considered
            </summary>
            <ol className="mt-2 space-y-3" start={5}>
              {findings.suspects.slice(4).map((s, i) => (
                <li key={s.cause}>
                  <SuspectCard suspect={s} rank={i + 5} units={units} />
                </li>
              ))}
            </ol>
          </details>
        )}
      </section>

      <section
        aria-labelledby="next-check-heading"
        className="rounded-card border-2 border-glacier-600 bg-glacier-50 p-4"
      >
        <h2 id="next-check-heading" className="text-xl font-bold text-glacier-900">
          Next check
        </h2>
        <p className="mt-1 text-lg font-bold" data-testid="next-check">
          {findings.nextCheck.instruction}
        </p>
        <p className="mt-1 text-ink-soft">{findings.nextCheck.reason}</p>
      </section>

      {findings.notes.length > 0 && (
        <ul className="list-disc space-y-1 pl-5 text-ink-soft">
          {findings.notes.map((n, i) => (
            <li key={i}>{formatMessage(n, units)}</li>
          ))}
        </ul>
      )}

      <CautionsList cautions={cautions} shownEarlier={shownEarlier} />

      {stored ? (
        <section
          aria-labelledby="conclusion-heading"
          className="space-y-2 rounded-card border-2 border-ink-muted p-4"
        >
          <h2 id="conclusion-heading" className="text-xl font-bold">
            Your conclusion
          </h2>
          <p className="font-bold" data-testid="kept-conclusion">
            {CAUSE_LABELS[chosen as CauseId]}
          </p>
          <p className="whitespace-pre-line">{notes}</p>
          <DetailsLine>
            <p>Worked out by findings engine version {findings.engineVersion}.</p>
          </DetailsLine>
        </section>
      ) : (
        <form onSubmit={submit} noValidate className="space-y-3 rounded-card border-2 border-ink-muted p-4">
          <h2 className="text-xl font-bold">Your conclusion</h2>
          <div>
            <label htmlFor="conclusion-cause" className="field-label">
              The cause you conclude
            </label>
            <select
              id="conclusion-cause"
              className="field-input"
              value={chosen}
              onChange={(e) => setCause(e.target.value as CauseId)}
            >
              {CAUSE_IDS.map((id) => (
                <option key={id} value={id}>
                  {CAUSE_LABELS[id]}
                </option>
              ))}
            </select>
          </div>
          {waitsForSignOff && (
            <fieldset>
              <legend className="field-label">Why: pick what it rests on</legend>
              <div className="flex flex-wrap gap-2">
                {CONCLUSION_REASON_IDS.map((id) => (
                  <button
                    key={id}
                    type="button"
                    aria-pressed={reasons.includes(id)}
                    onClick={() =>
                      setReasons((r) => (r.includes(id) ? r.filter((x) => x !== id) : [...r, id]))
                    }
                    className={clsx(
                      "min-h-touch rounded-full border-2 px-3 text-left text-sm font-bold",
                      reasons.includes(id)
                        ? "border-glacier-700 bg-glacier-700 text-white"
                        : "border-glacier-500 bg-paper text-glacier-900",
                    )}
                  >
                    {CONCLUSION_REASON_LABELS[id]}
                  </button>
                ))}
              </div>
            </fieldset>
          )}
          <div>
            <label htmlFor="conclusion-notes" className="field-label">
              {waitsForSignOff ? "Anything to add (optional)" : "Why, in a sentence or two (optional)"}
            </label>
            <textarea
              id="conclusion-notes"
              rows={2}
              className="field-input py-2"
              value={notes}
              onChange={(e) => setNotes(e.target.value)}
            />
          </div>
          {review && <ReviewThread review={review} />}
          {error && (
            <p role="alert" className="field-error">
              {error}
            </p>
          )}
          <div className="flex gap-2">
            <button type="button" className="btn-quiet" onClick={onBack}>
              Back
            </button>
            <button type="submit" className="btn-primary ml-auto flex-1" disabled={mutation.isPending}>
              {waitsForSignOff ? "Send to a senior for sign-off" : "Submit the diagnosis"}
            </button>
          </div>
          <DetailsLine>
            <p>Worked out by findings engine version {findings.engineVersion}.</p>
          </DetailsLine>
        </form>
      )}
    </div>
  );
}
