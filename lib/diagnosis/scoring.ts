import { CAUSE_IDS, type CauseId } from "./causes";
import type { Observation } from "./evidence-types";
import {
  CAUSE_PRIORS,
  LIKELIHOOD_TABLE,
  type LikelihoodRow,
  RANKING_GATES,
  type RankingGate,
} from "./likelihood-table";
import type { Message } from "./messages";
import type { ObservationId } from "./observations";

export interface EvidenceItem {
  observation: ObservationId | "ranking_gate";
  message: Message;
  /** Natural-log likelihood ratio this item added to the suspect's log-odds. */
  weight: number;
}

export interface CauseScore {
  cause: CauseId;
  logOdds: number;
  items: EvidenceItem[];
}

const CAUSE_INDEX = new Map<CauseId, number>(CAUSE_IDS.map((cause, i) => [cause, i]));
/** The table as dense weight vectors in CAUSE_IDS order, for the hot loop. */
const WEIGHT_VECTORS: ReadonlyMap<ObservationId, Float64Array> = new Map(
  LIKELIHOOD_TABLE.map((row: LikelihoodRow) => [
    row.observation,
    Float64Array.from(CAUSE_IDS, (cause) => row.weights[cause] ?? 0),
  ]),
);

export function weightOf(observation: ObservationId, cause: CauseId): number {
  return WEIGHT_VECTORS.get(observation)?.[CAUSE_INDEX.get(cause) ?? -1] ?? 0;
}

export function causeIndex(cause: CauseId): number {
  return CAUSE_INDEX.get(cause) ?? -1;
}

export interface OutcomeVector {
  /** Summed weights per cause, CAUSE_IDS order. */
  weights: Float64Array;
  /** exp(weights), kept to spare the next-check loop the exponentials. */
  expWeights: Float64Array;
}
const OUTCOME_VECTORS = new WeakMap<readonly ObservationId[], OutcomeVector>();

/** The weights a set of observations would add, per cause; memoised per (shared, constant) outcome array. */
export function outcomeVector(outcome: readonly ObservationId[]): OutcomeVector {
  let vector = OUTCOME_VECTORS.get(outcome);
  if (!vector) {
    const weights = new Float64Array(CAUSE_IDS.length);
    for (const id of outcome) {
      const row = WEIGHT_VECTORS.get(id);
      if (row) for (let i = 0; i < weights.length; i++) weights[i] = (weights[i] ?? 0) + (row[i] ?? 0);
    }
    vector = { weights, expWeights: weights.map(Math.exp) };
    OUTCOME_VECTORS.set(outcome, vector);
  }
  return vector;
}

/** Sum prior and weights per cause, then apply the ranking gates (last gate first, so the first gate ends on top). */
export function scoreCauses(
  observations: readonly Observation[],
  gates: readonly RankingGate[] = RANKING_GATES,
): CauseScore[] {
  const scores = CAUSE_IDS.map((cause): CauseScore => ({
    cause,
    logOdds: CAUSE_PRIORS[cause].logOdds,
    items: [],
  }));
  for (const observation of observations) {
    const weights = WEIGHT_VECTORS.get(observation.id);
    if (!weights) continue;
    const strength = observation.strength ?? 1;
    for (let i = 0; i < scores.length; i++) {
      const weight = (weights[i] ?? 0) * strength;
      const score = scores[i];
      if (weight === 0 || !score) continue;
      score.logOdds += weight;
      score.items.push({ observation: observation.id, message: observation.message, weight });
    }
  }
  const present = new Set(observations.map((o) => o.id));
  for (let i = gates.length - 1; i >= 0; i--) {
    const gate = gates[i];
    if (!gate || !gate.when.some((id) => present.has(id))) continue;
    const leader = scores.find((s) => s.cause === gate.leader);
    if (!leader) continue;
    const bestOther = Math.max(...scores.filter((s) => s.cause !== gate.leader).map((s) => s.logOdds));
    const boost = bestOther + gate.marginLogOdds - leader.logOdds;
    if (boost > 0) {
      // Set, not added: the gate puts the leader exactly its margin ahead, free of rounding.
      leader.logOdds = bestOther + gate.marginLogOdds;
      leader.items.unshift({ observation: "ranking_gate", message: { key: gate.message }, weight: boost });
    }
  }
  return scores;
}
