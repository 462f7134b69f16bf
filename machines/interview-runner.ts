import { stepIds, type StepId } from "@/lib/interview/steps";
import { applyAnswer, applyEnterStep, applySkip, applyTyping } from "./interview-actions";
import { BACK_MOVES, firstMove, NEXT_MOVES } from "./interview-chart";
import {
  createInterviewContext,
  type InterviewContext,
  type InterviewEvent,
  type InterviewInput,
} from "./interview-context";
import * as guards from "./interview-guards";

/*
 * The interview's chart (interview-chart.ts) run on the phone: the same moves, guards and reducers as
 * the xstate machine in interview.ts, in the order xstate takes them, without loading xstate at the
 * vehicle. interview-runner.test.ts sends both the same generated events and fails on any difference.
 *
 * The order, as xstate runs it: an event's move (its reducer, then the step it leads to and that
 * step's entry), then any move without an event until none applies (a resumed interview opening at
 * its step; a step that an answer took off the route falling back to the furthest one open), then
 * the NEXT a SKIP raises.
 */

export type RunnerState = "resuming" | StepId;

export interface InterviewRun {
  value: RunnerState;
  context: InterviewContext;
  /** Whether the event would move the interview or change its context now (xstate's snapshot.can). */
  can(event: InterviewEvent): boolean;
}

export interface InterviewRunner {
  getSnapshot(): InterviewRun;
  send(event: InterviewEvent): void;
  subscribe(listener: (run: InterviewRun) => void): { unsubscribe(): void };
}

function movesFor(state: RunnerState, type: "NEXT" | "BACK") {
  return state === "resuming" ? [] : (type === "NEXT" ? NEXT_MOVES : BACK_MOVES)[state];
}

function canFrom(value: RunnerState, context: InterviewContext, event: InterviewEvent): boolean {
  switch (event.type) {
    case "ANSWER":
    case "TYPE":
      return true;
    case "SKIP":
      return guards.currentStepOptional(context);
    case "GOTO":
      return stepIds.includes(event.step) && guards.mayOpen(context, event.step);
    case "NEXT":
    case "BACK":
      return firstMove(movesFor(value, event.type), context) !== undefined;
  }
}

export function createInterviewRunner(input?: InterviewInput): InterviewRunner {
  let value: RunnerState = "resuming";
  let context = createInterviewContext(input);
  const listeners = new Set<(run: InterviewRun) => void>();

  const change = (changes: Partial<InterviewContext>) => {
    context = { ...context, ...changes };
  };
  const enter = (step: StepId) => {
    value = step;
    change(applyEnterStep(context, step));
  };

  /** Moves without an event: the resumed step first, then the fall-back from a step off the route. */
  function settle() {
    for (;;) {
      if (value === "resuming") {
        const step = stepIds.find((s) => guards.resumesAt(context, s));
        if (step !== undefined) {
          enter(step);
          continue;
        }
      }
      const fallBack = stepIds.find((s) => guards.mustFallBackTo(context, s));
      if (fallBack === undefined) return;
      enter(fallBack);
    }
  }

  /** One event's move; true when it was taken. */
  function take(event: InterviewEvent): boolean {
    switch (event.type) {
      case "ANSWER":
        change(applyAnswer(context, event.group, event.values));
        return true;
      case "TYPE":
        change(applyTyping(context, event.group, event.values));
        return true;
      case "SKIP":
        if (!guards.currentStepOptional(context)) return false;
        change(applySkip(context));
        return true;
      case "GOTO": {
        const step = stepIds.find((s) => event.step === s && guards.mayOpen(context, s));
        if (step === undefined) return false;
        enter(step);
        return true;
      }
      case "NEXT":
      case "BACK": {
        const move = firstMove(movesFor(value, event.type), context);
        if (move === undefined) return false;
        enter(move.target);
        return true;
      }
    }
  }

  const snapshotOf = (): InterviewRun => {
    const [v, c] = [value, context];
    return { value: v, context: c, can: (event) => canFrom(v, c, event) };
  };

  settle();
  let snapshot = snapshotOf();

  return {
    getSnapshot: () => snapshot,
    send(event) {
      if (take(event)) {
        settle();
        // A skipped step moves on as NEXT would (the machine raises NEXT after the skip).
        if (event.type === "SKIP" && take({ type: "NEXT" })) settle();
        snapshot = snapshotOf();
      }
      // Told after every event, as an xstate actor tells its observers.
      for (const listener of listeners) listener(snapshot);
    },
    subscribe(listener) {
      listeners.add(listener);
      return { unsubscribe: () => listeners.delete(listener) };
    },
  };
}
