"use client";

import { memo, useCallback, useEffect, useMemo, useRef, useSyncExternalStore } from "react";
import dynamic from "next/dynamic";
import { useMachine } from "@xstate/react";
import { interviewMachine } from "@/machines/interview";
import {
  savedInterviewOf,
  viewOf,
  type InterviewSnapshot,
  type InterviewView,
  type SavedInterview,
} from "@/machines/interview-view";
import { STEP_LABELS, type GroupId, type StepId } from "@/lib/interview/steps";
import { altitudeFor } from "@/lib/interview/branches";
import { CautionsFold } from "@/components/cautions/cautions-fold";
import { STEP_LEADS } from "./labels";
import { ProgressStrip } from "./progress-strip";
import { SaveBanner } from "./save-banner";
import { SentBackNote, type ReviewContext } from "./review-thread";
import type { SpecPick } from "./spec-matches";
import { StepForm, type StepFormHandle } from "./step-form";
import { useAutosave } from "./use-autosave";
import { useShownCautions } from "./use-shown-cautions";
import type { StepCautionCards } from "./step-caution-cards";
import type { PhysicsContext } from "@/lib/interview/readouts";
import type { ReaderUnits } from "@/lib/units";
import { attentionOf } from "./attention";
import type { ValuesMode } from "./use-group-form";

// A keystroke re-renders the interview; the parts that did not change skip it (their props keep
// their identity while only a draft changes, see useView).
const StepCautions = memo(CautionsFold);
const Progress = memo(ProgressStrip);
const ReviewNote = memo(SentBackNote);
// The spec table's matches show on the system step only, and load with it.
const Specs = memo(dynamic(() => import("./spec-matches").then((m) => m.SpecMatchesWithQueries)));

/**
 * The view of the interview, recomputed only when something it shows has changed. A keystroke changes
 * the drafts (and the group's messages) only: the route, the progress and the cautions, which come
 * from the answers, keep their identity, so the memoised parts of the screen skip that keystroke.
 */
function useView(snapshot: InterviewSnapshot): InterviewView {
  const { answers, step, visited, skipped, shop, errors, drafts } = snapshot.context;
  // The messages are new objects on every keystroke; their text is what the progress strip reads.
  const errorsKey = JSON.stringify(errors);
  const stateKey = JSON.stringify(snapshot.value);
  const settled = useMemo(
    () => viewOf(snapshot),
    // The snapshot itself is new on every keystroke; these are what viewOf reads from it.
    // eslint-disable-next-line react-hooks/exhaustive-deps
    [answers, step, visited, skipped, shop, errorsKey, stateKey],
  );
  return useMemo(() => ({ ...settled, errors, drafts }), [settled, errors, drafts]);
}

// The findings step carries the diagnosis engine; it loads when the technician reaches it.
const FindingsStep = dynamic(() => import("./findings-step").then((m) => m.FindingsStepWithQueries), {
  loading: () => <p role="status">Working out the findings…</p>,
});

export interface InterviewProps {
  caseId: number;
  version: number;
  record: Partial<SavedInterview>;
  /** Changes made on this device that the server has not confirmed; they are sent at once. */
  pendingFromDevice: number;
  shop: { altitudeM: number };
  /** The technician's units (their profile, else the shop's system); every field starts in them. */
  units: ReaderUnits;
  /** The technician's locale, for reading "1,200" and "1,2" the way they write them. */
  locale?: string;
  waitsForSignOff: boolean;
  /** The case's review so far: a sent-back case shows the senior's comment here and at the findings. */
  review: ReviewContext;
  heading: string;
  vehicleId: number | null;
  /** Every caution a step can show, drawn on the server in the technician's units. */
  cautionCards: StepCautionCards;
}

const noChange = () => () => {};
const reload = () => window.location.reload();

export function Interview({
  caseId,
  version,
  record,
  pendingFromDevice,
  shop,
  units,
  locale,
  waitsForSignOff,
  review,
  heading,
  vehicleId,
  cautionCards,
}: InterviewProps) {
  // Without a locale on the profile, numbers are read the way this device's language writes them.
  const deviceLocale = useSyncExternalStore(
    noChange,
    () => navigator.language,
    () => undefined,
  );
  const readingLocale = locale ?? deviceLocale;
  const machineShop = useMemo(() => ({ altitudeM: shop.altitudeM }), [shop.altitudeM]);
  const [snapshot, send, actor] = useMachine(interviewMachine, { input: { ...record, shop: machineShop } });
  const view = useView(snapshot);
  const { answers, drafts, step } = snapshot.context;
  const autosave = useAutosave({ caseId, initialVersion: version });
  const formRef = useRef<StepFormHandle>(null);
  const headingRef = useRef<HTMLHeadingElement>(null);

  useEffect(() => {
    const initial = savedInterviewOf(actor.getSnapshot().context);
    if (pendingFromDevice > 0) autosave.queue(initial, { pendingFromEarlier: pendingFromDevice - 1 });
    else autosave.markSaved(initial);
    const subscription = actor.subscribe((s) => autosave.queue(savedInterviewOf(s.context)));
    return () => subscription.unsubscribe();
    // The actor and the autosave hook live as long as this screen.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [actor]);

  // Put the technician straight into the first field of each step, the first one too. The findings
  // are read, not typed into: on arriving there nothing takes focus, so no keyboard covers the
  // ranking; later steps move focus to the heading when they have no field.
  const firstRender = useRef(true);
  useEffect(() => {
    const arriving = firstRender.current;
    firstRender.current = false;
    if (step === "findings") {
      if (!arriving) headingRef.current?.focus({ preventScroll: true });
      window.scrollTo({ top: 0 });
      return;
    }
    const input = document.querySelector<HTMLElement>(
      "#interview-step input[type=text], #interview-step textarea",
    );
    if (input) input.focus();
    else if (!arriving) headingRef.current?.focus();
  }, [step]);

  const stepCautions = useMemo(
    () => view.cautions.filter((c) => c.id !== "defer_to_procedure" || step === "complaint"),
    [view.cautions, step],
  );
  const shownEarlier = useShownCautions(
    caseId,
    step,
    stepCautions.map((c) => c.id),
  );
  const stepCards = useMemo(
    () => stepCautions.map((c) => cautionCards.cards[c.id]),
    [stepCautions, cautionCards],
  );

  const physics: PhysicsContext = useMemo(
    () => ({
      refrigerant: answers.system?.refrigerant,
      expansionDevice: answers.system?.expansionDevice,
      labelChargeG: answers.system?.labelChargeG,
      ambientC: answers.conditions?.ambientC,
      relativeHumidityPct: answers.conditions?.relativeHumidityPct,
      altitudeM: altitudeFor(answers, machineShop),
    }),
    [answers, machineShop],
  );

  const onValues = useCallback(
    (values: Record<string, unknown>, mode: ValuesMode) =>
      view.group && send({ type: mode === "commit" ? "ANSWER" : "TYPE", group: view.group, values }),
    [send, view.group],
  );

  const openStep = useCallback((target: StepId) => send({ type: "GOTO", step: target }), [send]);
  const applySpec = useCallback((pick: SpecPick) => formRef.current?.apply({ ...pick }), []);
  const attention = useMemo(
    () => attentionOf(snapshot.context, units),
    // attentionOf reads these four from the context.
    // eslint-disable-next-line react-hooks/exhaustive-deps
    [answers, drafts, view.errors, view.skipped, units],
  );

  async function next() {
    if (formRef.current && view.group) {
      const values = await formRef.current.check();
      if (!values) return;
      // An untouched group (no symptoms ticked, say) is still an answer.
      send({ type: "ANSWER", group: view.group, values });
    }
    send({ type: "NEXT" });
  }

  const group: GroupId | null = view.group;
  return (
    <div className="space-y-4">
      <div>
        <p className="text-sm font-bold text-ink-soft">{heading}</p>
        <Progress entries={view.progress} onOpen={openStep} />
      </div>
      <ReviewNote review={review} />
      <SaveBanner status={autosave.status} attention={attention} onReload={reload} />
      <section id="interview-step" aria-labelledby="step-heading" className="card space-y-4">
        <header>
          <h1 id="step-heading" ref={headingRef} tabIndex={-1} className="text-2xl font-bold outline-none">
            {STEP_LABELS[step]}
          </h1>
          {STEP_LEADS[step] && <p className="text-ink-soft">{STEP_LEADS[step]}</p>}
        </header>
        {step !== "findings" && (
          <StepCautions cards={stepCards} shownEarlier={shownEarlier} foldMark={cautionCards.foldMark} />
        )}
        {step === "system" && vehicleId !== null && <Specs vehicleId={vehicleId} onPick={applySpec} />}
        {group && (
          <form
            noValidate
            onSubmit={(e) => {
              e.preventDefault();
              void next();
            }}
          >
            <StepForm
              key={step}
              ref={formRef}
              group={group}
              saved={drafts[group] ?? answers[group]}
              answers={answers}
              issues={view.errors[group]}
              units={units}
              locale={readingLocale}
              physics={physics}
              shop={machineShop}
              onValues={onValues}
            />
            <div className="sticky bottom-0 -mx-4 mt-6 flex gap-2 border-t border-paper-line bg-paper px-4 py-3">
              {view.canGoBack && (
                <button type="button" className="btn-quiet" onClick={() => send({ type: "BACK" })}>
                  Back
                </button>
              )}
              {view.canSkip && (
                <button type="button" className="btn-quiet" onClick={() => send({ type: "SKIP" })}>
                  Skip
                </button>
              )}
              <button type="submit" className="btn-primary ml-auto min-h-glove flex-1 text-lg">
                Next
              </button>
            </div>
          </form>
        )}
        {step === "findings" && (
          <FindingsStep
            caseId={caseId}
            input={view.diagnosisInput}
            units={units}
            interviewCautions={view.cautions}
            waitsForSignOff={waitsForSignOff}
            review={review}
            shownEarlier={shownEarlier}
            saveStatus={autosave.status}
            currentVersion={autosave.currentVersion}
            onBack={() => send({ type: "BACK" })}
          />
        )}
      </section>
    </div>
  );
}
