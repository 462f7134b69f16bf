"use client";

import { useEffect, useMemo, useRef, useState } from "react";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useMutation } from "@tanstack/react-query";
import {
  CAUSE_IDS,
  CAUSE_LABELS,
  diagnose,
  firstScreenRanking,
  formatMessage,
  type CauseId,
  type DiagnosisInput,
  type ReaderUnits,
} from "@/lib/diagnosis";
import { cautionsById } from "@/lib/cautions/catalog";
import type { CautionRef } from "@/lib/interview/caution-ids";
import { ApiError } from "@/lib/queries/api-fetch";
import { submitCase, type CaseSubmitResult } from "@/lib/queries/case-submit";
import { CautionsList, type CautionItem } from "@/components/cautions/cautions-list";
import { SuspectCard } from "./suspect-card";
import { FindingsRanking } from "./findings-ranking";
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
import { Providers } from "@/components/providers";

/** The cautions that say the system must not be run (lib/cautions/catalog.ts). */
const DO_NOT_RUN_CAUTIONS: ReadonlySet<string> = new Set(["empty_system", "electric_never_without_charge"]);

interface Props {
  caseId: number;
  input: DiagnosisInput | null;
  /** The technician's units: every number in the findings is shown in them. */
  units?: ReaderUnits;
  /** The interview's cautions in force, by id; the findings screen words them from the catalogue. */
  interviewCautions: CautionRef[];
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

/**
 * The findings step inside TanStack Query's client: the interview's layout has none in its first load
 * (app/(at-vehicle)/layout.tsx), so the client comes with this step when it is reached.
 */
export function FindingsStepWithQueries(props: Props) {
  return (
    <Providers>
      <FindingsStep {...props} />
    </Providers>
  );
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
  const allCautions: CautionItem[] = cautionsById(interviewCautions.map((c) => c.id));
  for (const c of findings.cautions) if (!allCautions.some((x) => x.id === c.id)) allCautions.push(c);
  // While the system must not be run, its cautions follow the next check and never fold, however often seen.
  const pinned = findings.doNotRun.active ? allCautions.filter((c) => DO_NOT_RUN_CAUTIONS.has(c.id)) : [];
  const cautions = allCautions.filter((c) => !pinned.includes(c));
  const ranking = firstScreenRanking(findings.suspects);

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
    <div className="space-y-3">
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
      <FindingsRanking ranking={ranking} units={units} />

      <section
        aria-labelledby="next-check-heading"
        className={clsx(
          "rounded-card border-2 border-l-8 px-3 py-2",
          findings.doNotRun.active ? "border-ember-500 bg-ember-50" : "border-glacier-700 bg-glacier-50",
        )}
        data-testid={findings.doNotRun.active ? "do-not-run" : undefined}
      >
        <h2
          id="next-check-heading"
          className={clsx(
            "mr-2 inline text-sm font-bold uppercase tracking-wide",
            findings.doNotRun.active ? "text-ember-700" : "text-glacier-900",
          )}
        >
          Next check
        </h2>
        {findings.doNotRun.active && (
          <p className="mt-1 font-bold text-ember-700">{findings.nextCheck.reason}</p>
        )}
        <p
          className={clsx("font-semibold leading-snug", findings.doNotRun.active ? "mt-1" : "inline")}
          data-testid="next-check"
        >
          {findings.nextCheck.instruction}
        </p>
        {!findings.doNotRun.active && (
          <p className="mt-1 text-sm text-ink-soft">{findings.nextCheck.reason}</p>
        )}
      </section>

      {pinned.length > 0 && <CautionsList cautions={pinned} heading="Do not run" foldNotices={false} />}
      <CautionsList cautions={cautions} shownEarlier={shownEarlier} />

      <section aria-labelledby="why-heading" className="space-y-3">
        <h2 id="why-heading" className="text-xl font-bold">
          {ranking.leading.length === 1 ? "Why this cause" : "Why these causes"}
        </h2>
        <p className="text-ink-soft" data-testid="measured">
          {findings.measured.statement}
        </p>
        <ol className="space-y-3">
          {ranking.leading.map(({ suspect }, i) => (
            <li key={suspect.cause}>
              <SuspectCard suspect={suspect} rank={i + 1} units={units} percent={null} />
            </li>
          ))}
        </ol>
        {findings.notes.length > 0 && (
          <ul className="list-disc space-y-1 pl-5 text-ink-soft">
            {findings.notes.map((n, i) => (
              <li key={i}>{formatMessage(n, units)}</li>
            ))}
          </ul>
        )}
      </section>

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
