import { CAUSE_IDS, type CauseId } from "./causes";
import type { Observation } from "./evidence-types";
import { CAUSE_PRIORS, LIKELIHOOD_TABLE, type LikelihoodRow, RANKING_GATES, type RankingGate } from "./likelihood-table";
import { groupOf, KEY_READING_GROUPS, type ObservationId, type ReadingGroup } from "./observations";

export interface EvidenceItem {
  observation: ObservationId | "ranking_gate";
  text: string;
  /** Natural-log likelihood ratio this item added to the suspect's log-odds. */
  weight: number;
}

export interface CauseScore {
  cause: CauseId;
  logOdds: number;
  items: EvidenceItem[];
}

const ROWS_BY_OBSERVATION: ReadonlyMap<ObservationId, LikelihoodRow> = new Map(LIKELIHOOD_TABLE.map((row) => [row.observation, row]));

export function weightOf(observation: ObservationId, cause: CauseId): number {
  return ROWS_BY_OBSERVATION.get(observation)?.weights[cause] ?? 0;
}

/** Per cause, the largest |weight| each key reading group can give: what a missing reading costs. */
const KEY_POTENTIAL: Record<CauseId, Map<ReadingGroup, number>> = Object.fromEntries(
  CAUSE_IDS.map((cause) => {
    const potential = new Map<ReadingGroup, number>();
    for (const row of LIKELIHOOD_TABLE) {
      const group = groupOf(row.observation) as ReadingGroup;
      if (!KEY_READING_GROUPS.includes(group)) continue;
      potential.set(group, Math.max(potential.get(group) ?? 0, Math.abs(row.weights[cause] ?? 0)));
    }
    return [cause, potential];
  }),
) as Record<CauseId, Map<ReadingGroup, number>>;

/** Share of this cause's possible key-reading evidence that was actually measured, 0–1. */
export function readingCoverage(cause: CauseId, observedGroups: ReadonlySet<ReadingGroup>): number {
  let total = 0;
  let seen = 0;
  for (const [group, potential] of KEY_POTENTIAL[cause]) {
    total += potential;
    if (observedGroups.has(group)) seen += potential;
  }
  return total === 0 ? 1 : seen / total;
}

export const logistic = (logOdds: number) => 1 / (1 + Math.exp(-logOdds));

/** Sum prior and weights per cause, then apply the ranking gates (last gate first, so the first gate ends on top). */
export function scoreCauses(observations: readonly Observation[], gates: readonly RankingGate[] = RANKING_GATES): CauseScore[] {
  const scores = CAUSE_IDS.map((cause): CauseScore => ({ cause, logOdds: CAUSE_PRIORS[cause].logOdds, items: [] }));
  for (const observation of observations) {
    const row = ROWS_BY_OBSERVATION.get(observation.id);
    if (!row) continue;
    for (const score of scores) {
      const weight = row.weights[score.cause];
      if (weight === undefined || weight === 0) continue;
      score.logOdds += weight;
      score.items.push({ observation: observation.id, text: observation.text, weight });
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
      leader.logOdds += boost;
      leader.items.unshift({ observation: "ranking_gate", text: gate.reason, weight: boost });
    }
  }
  return scores;
}
