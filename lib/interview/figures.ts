import { CASE_FIGURES, FIGURE_IDS, type CaseFigures, type FigureId } from "@/lib/contracts/case-figures";
import type { InterviewAnswers } from "./answers";

// The interview's side of the figures typed once (lib/contracts/case-figures.ts): what its answers
// say about each, and the answers as shown and stored once a figure lives elsewhere.

type Json = Record<string, unknown>;
const isObject = (v: unknown): v is Json => typeof v === "object" && v !== null && !Array.isArray(v);

/** A figure as its home stores it: whole grams and millilitres, percentages to 0.01. */
export function roundFigure(id: FigureId, value: number): number {
  const scale = 10 ** CASE_FIGURES[id].decimals;
  return Math.round(value * scale) / scale;
}

/**
 * What the valid answers say about each figure: a number; null when its group was answered without
 * it (the technician emptied it, or said the charge was not recovered); absent when its group was
 * not answered, which says nothing. Drafts never reach here: only valid groups are answers.
 */
export function figuresInAnswers(answers: InterviewAnswers): Partial<CaseFigures> {
  const said: Partial<CaseFigures> = {};
  for (const id of FIGURE_IDS) {
    const group = answers[CASE_FIGURES[id].group] as Json | undefined;
    if (!group) continue;
    const notRecovered = id === "recoveredChargeG" && answers.chargeAudit?.recovered === false;
    const value = notRecovered ? undefined : group[id];
    said[id] = typeof value === "number" && Number.isFinite(value) ? roundFigure(id, value) : null;
  }
  return said;
}

/**
 * The stored answers (`answers` of the interview record, groups as stored) with the figures kept
 * elsewhere written in, so the interview shows the one value wherever it lives. A recovered mass
 * means the charge was recovered; a group the interview has not reached is started only where the
 * figure alone makes it a whole answer (the identifier's, and a recovery with its mass; the mass
 * comes before the oil and the charged mass in CASE_FIGURES, so those join the group it started).
 */
export function answersWithFigures(saved: unknown, figures: Partial<CaseFigures>): Json {
  const answers: Json = isObject(saved) ? { ...saved } : {};
  for (const id of FIGURE_IDS) {
    const value = figures[id];
    // A home holding none leaves the answers as stored: every save takes a figure out of the answers
    // once it lives elsewhere, so a copy still there predates that (a case not yet moved) and is shown.
    if (value === undefined || value === null) continue;
    const { group } = CASE_FIGURES[id];
    const current = answers[group];
    if (isObject(current)) {
      answers[group] = { ...current, [id]: value, ...(id === "recoveredChargeG" ? { recovered: true } : {}) };
    } else if (group === "identification") {
      answers[group] = { [id]: value };
    } else if (id === "recoveredChargeG") {
      answers[group] = { recovered: true, [id]: value };
    }
  }
  return answers;
}

/** The stored answers without the figures whose home is elsewhere: one stored value each. */
export function answersWithoutFigures(saved: unknown, ids: readonly FigureId[]): Json {
  const answers: Json = isObject(saved) ? { ...saved } : {};
  for (const id of ids) {
    const { group } = CASE_FIGURES[id];
    const current = answers[group];
    if (!isObject(current) || !(id in current)) continue;
    const next = { ...current };
    delete next[id];
    answers[group] = next;
  }
  return answers;
}
