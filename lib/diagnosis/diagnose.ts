import { CAUSE_IDS, type CauseId } from "./causes";
import { type Caution, collectCautions } from "./cautions";
import { ENGINE_VERSION } from "./engine-version";
import { extractEvidence } from "./evidence";
import type { ComputedValues } from "./evidence-types";
import { type DoNotRun, doNotRunState } from "./do-not-run";
import { chooseNextCheck, type NextCheck } from "./next-check";
import type { Message } from "./messages";
import type { ObservationId } from "./observations";
import type { DiagnosisInput } from "./schema";
import { type EvidenceItem, logistic, readingCoverage, scoreCauses } from "./scoring";

export interface Suspect {
  cause: CauseId;
  /** 0–1: logistic of the summed log-odds. Higher ranks first. */
  score: number;
  /** 0–1: how much of this cause's key-reading evidence was measured (lower when readings are missing). */
  confidence: number;
  evidenceFor: Message[];
  evidenceAgainst: Message[];
  logOdds: number;
  /** Every item that moved this suspect's score, with its weight, for review. */
  evidence: EvidenceItem[];
}

export interface Findings {
  engineVersion: string;
  suspects: Suspect[];
  /** The "do not run" state: while it holds, no next check runs the system. */
  doNotRun: DoNotRun;
  nextCheck: NextCheck;
  cautions: Caution[];
  computed: ComputedValues;
  /** Facts that moved no score but matter to the reader. */
  notes: Message[];
}

const CAUSE_ORDER = new Map<CauseId, number>(CAUSE_IDS.map((cause, i) => [cause, i]));
const byStrength = (a: EvidenceItem, b: EvidenceItem) => Math.abs(b.weight) - Math.abs(a.weight);
const byRank = (a: Suspect, b: Suspect) =>
  b.logOdds - a.logOdds || (CAUSE_ORDER.get(a.cause) ?? 0) - (CAUSE_ORDER.get(b.cause) ?? 0);
const round = (value: number, decimals: number) => Math.round(value * 10 ** decimals) / 10 ** decimals;

/** Rank the likely causes of a cooling complaint. Expects input already accepted by diagnosisInputSchema. */
export function diagnose(input: DiagnosisInput): Findings {
  const extraction = extractEvidence(input);
  const present = new Set<ObservationId>(extraction.observations.map((o) => o.id));
  const mixed = present.has("purity:fail") || present.has("symptom:identifier_flags_hydrocarbon");
  const doNotRun = doNotRunState(input);

  const suspects = scoreCauses(extraction.observations)
    .map((s): Suspect => {
      const evidence = s.items.sort(byStrength);
      const evidenceFor: Message[] = [];
      const evidenceAgainst: Message[] = [];
      for (const item of evidence) (item.weight > 0 ? evidenceFor : evidenceAgainst).push(item.message);
      return {
        cause: s.cause,
        score: logistic(s.logOdds),
        confidence: round(
          readingCoverage(s.cause, extraction.observedGroups) * extraction.confidenceFactor,
          3,
        ),
        evidenceFor,
        evidenceAgainst,
        logOdds: s.logOdds,
        evidence,
      };
    })
    .sort(byRank);

  const leaders = suspects.slice(0, 2).map((s) => s.cause);
  const ctx = {
    input,
    extraction,
    symptoms: new Set(input.symptoms ?? []),
    mixed,
    doNotRun: doNotRun.active,
    gapLogOdds: (suspects[0]?.logOdds ?? 0) - (suspects[1]?.logOdds ?? 0),
  };
  return {
    engineVersion: ENGINE_VERSION,
    suspects,
    doNotRun,
    nextCheck: chooseNextCheck(ctx, leaders, doNotRun),
    cautions: collectCautions({ input, observations: present, leaders, mixed, doNotRun: doNotRun.active }),
    computed: extraction.computed,
    notes: extraction.notes,
  };
}
