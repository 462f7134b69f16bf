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
import { type Measured, measuredStatement } from "./measured";
import { type EvidenceItem, scoreCauses } from "./scoring";

export interface Suspect {
  cause: CauseId;
  /** This cause's share of the likelihood, 0–1: the shares of all causes sum to 1. Higher ranks first. */
  share: number;
  /** False when the readings cannot speak to this cause (a failed identifier): the screen says "not assessed". */
  assessed: boolean;
  evidenceFor: Message[];
  evidenceAgainst: Message[];
  /** Prior plus evidence, natural log-odds: for review, not for the screen. */
  logOdds: number;
  /** Every item that moved this suspect's score, with its weight, for review. */
  evidence: EvidenceItem[];
}

export interface Findings {
  engineVersion: string;
  suspects: Suspect[];
  /** How much of the case was measured, in one plain statement. */
  measured: Measured;
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
  b.logOdds - a.logOdds ||
  // Stryker disable next-line ArithmeticOperator,LogicalOperator: the suspects arrive in CAUSE_IDS order, the sort is stable and every cause is in CAUSE_ORDER
  (CAUSE_ORDER.get(a.cause) ?? 0) - (CAUSE_ORDER.get(b.cause) ?? 0);

/**
 * Each cause's share of the likelihood: exp(log-odds) normalised over all causes, so the shares sum to 1
 * (the causes treated as rival explanations of one complaint). When the refrigerant failed identification
 * the other causes cannot be assessed on a mixed charge: the contamination takes the whole share.
 */
function assignShares(suspects: Suspect[], refrigerantContaminated: boolean): void {
  if (refrigerantContaminated) {
    for (const s of suspects) {
      const contaminated = s.cause === "contaminated_refrigerant";
      s.share = contaminated ? 1 : 0;
      s.assessed = contaminated;
    }
    return;
  }
  // Stryker disable next-line MethodExpression: the shares are the same for any shift; the largest only keeps exp() in range
  const top = Math.max(...suspects.map((s) => s.logOdds));
  let total = 0;
  for (const s of suspects) {
    // Stryker disable next-line ArithmeticOperator: the shares are the same for any shift; the largest only keeps exp() in range
    s.share = Math.exp(s.logOdds - top);
    total += s.share;
  }
  for (const s of suspects) s.share /= total;
}

/** Rank the likely causes of a cooling complaint. Expects input already accepted by diagnosisInputSchema. */
export function diagnose(input: DiagnosisInput): Findings {
  const extraction = extractEvidence(input);
  const present = new Set<ObservationId>(extraction.observations.map((o) => o.id));
  const refrigerantContaminated =
    present.has("purity:fail") || present.has("symptom:identifier_flags_hydrocarbon");
  const doNotRun = doNotRunState(input);

  const suspects = scoreCauses(extraction.observations)
    .map((s): Suspect => {
      const evidence = s.items.sort(byStrength);
      const evidenceFor: Message[] = [];
      const evidenceAgainst: Message[] = [];
      // Stryker disable next-line EqualityOperator: scoreCauses keeps no item of weight 0
      for (const item of evidence) (item.weight > 0 ? evidenceFor : evidenceAgainst).push(item.message);
      return {
        cause: s.cause,
        share: 0,
        assessed: true,
        evidenceFor,
        evidenceAgainst,
        logOdds: s.logOdds,
        evidence,
      };
    })
    .sort(byRank);
  assignShares(suspects, refrigerantContaminated);

  const ctx = {
    input,
    extraction,
    // Stryker disable next-line ArrayDeclaration: a symptom id that no check asks about changes nothing
    symptoms: new Set(input.symptoms ?? []),
    refrigerantContaminated,
    doNotRun: doNotRun.active,
    // Stryker disable next-line OptionalChaining: every cause is ranked, so both places are filled
    gapLogOdds: (suspects[0]?.logOdds ?? 0) - (suspects[1]?.logOdds ?? 0),
  };
  return {
    engineVersion: ENGINE_VERSION,
    suspects,
    measured: measuredStatement(extraction.observedGroups, refrigerantContaminated),
    doNotRun,
    nextCheck: chooseNextCheck(ctx, suspects, doNotRun),
    cautions: collectCautions({
      input,
      observations: present,
      ranking: suspects,
      refrigerantContaminated,
      doNotRun: doNotRun.active,
    }),
    computed: extraction.computed,
    notes: extraction.notes,
  };
}
