import type { CauseId } from "@/lib/diagnosis/causes";
import { ventColdLimitC } from "@/lib/diagnosis/evidence";
import { VENT_C } from "@/lib/diagnosis/grading";
import type { NextCheck } from "@/lib/diagnosis/next-check";
import type {
  OwnerAnswer,
  OwnerFactLine,
  OwnerProposalView,
  OwnerRepairLine,
  OwnerSummary,
} from "@/lib/contracts/owner-summary";
import { REPAIR_CATALOG, isRepairId, type RepairId } from "@/lib/repairs/catalog";
import { withArticle } from "@/lib/article";
import { OWNER_CAUSES, isCauseId } from "./causes";
import { OWNER_CHECKS } from "./checks";
import type { OwnerFacts } from "./facts";
import { termsUsedIn } from "./glossary";
import { formatPrice } from "./price";
import { chargeComparison, ownerMass, ownerTemperature, ownerVolume } from "./units";

export interface ProposalRecord {
  id: number;
  repairIds: readonly string[];
  priceMinor: number | null;
  currency: string;
  note: string | null;
  createdAt: Date | string;
  answer: OwnerAnswer | null;
  answerNote: string | null;
  answeredAt: Date | string | null;
}

export interface OwnerSummaryInput {
  shopName: string;
  vehicle: string | null;
  complaint: string;
  status: string;
  conclusionCause: string | null;
  /** The findings snapshot as stored; read defensively (cause order and next check only). */
  findings: unknown;
  facts: OwnerFacts;
  /** Repairs the service record shows as done. */
  repairsDone: readonly RepairId[];
  proposal: ProposalRecord | null;
}

// Charge within this of the label is "what the label asks for" (SAE J2843 charge accuracy, ±15 g).
const CHARGE_MATCH_G = 15;

/** The cause the page explains: the technician's conclusion, else the leading suspect. */
export function ownerCause(conclusionCause: string | null, findings: unknown): CauseId | null {
  if (isCauseId(conclusionCause)) return conclusionCause;
  const suspects = (findings as { suspects?: unknown } | null)?.suspects;
  const first = Array.isArray(suspects) ? (suspects[0] as { cause?: unknown } | undefined) : undefined;
  return isCauseId(first?.cause) ? first.cause : null;
}

function nextCheckId(findings: unknown): NextCheck["check"] | null {
  const check = (findings as { nextCheck?: { check?: unknown } } | null)?.nextCheck?.check;
  return typeof check === "string" && Object.hasOwn(OWNER_CHECKS, check)
    ? (check as NextCheck["check"])
    : null;
}

function chargeFacts(
  facts: OwnerFacts,
  cause: CauseId | null,
): { lines: OwnerFactLine[]; key: string | null } {
  const lines: OwnerFactLine[] = [];
  let key: string | null = null;
  const { units, labelChargeG, foundChargeG, chargedG } = facts;
  if (foundChargeG !== undefined && labelChargeG !== undefined && labelChargeG > 0) {
    const comparison = chargeComparison(((foundChargeG - labelChargeG) / labelChargeG) * 100);
    const label = ownerMass(labelChargeG, units);
    const found = ownerMass(foundChargeG, units);
    if (comparison) {
      key = `The system held ${comparison}.`;
      const why =
        foundChargeG < labelChargeG
          ? "A sealed system only loses refrigerant through a leak."
          : "Too much is as bad as too little.";
      lines.push({
        fact: `We took out and weighed ${found} of refrigerant. The maker's label calls for ${label}.`,
        meaning: `${key} ${why}`,
      });
    } else {
      lines.push({
        fact: `We took out and weighed ${found} of refrigerant. The maker's label calls for ${label}.`,
        meaning:
          cause === "overcharge" || cause === "undercharge"
            ? "So the amount was close to right."
            : "So the amount was right, and the cause lies elsewhere.",
      });
    }
  }
  if (chargedG !== undefined) {
    const matches = labelChargeG !== undefined && Math.abs(chargedG - labelChargeG) <= CHARGE_MATCH_G;
    lines.push({
      fact: `After the repair we weighed in ${ownerMass(chargedG, units)} of refrigerant.`,
      meaning: matches
        ? "That is the amount on the maker's label."
        : labelChargeG !== undefined
          ? `The maker's label calls for ${ownerMass(labelChargeG, units)}.`
          : "We went by the maker's figure for your car.",
    });
  }
  return { lines, key };
}

function ventFact(facts: OwnerFacts): OwnerFactLine | null {
  const { ventC, ambientC, units } = facts;
  if (ventC === undefined || ambientC === undefined) return null;
  // The engine's own vent grading (its thresholds and their source live in lib/diagnosis/grading).
  const { coldMaxC } = ventColdLimitC({ ambientC });
  const meaning =
    ventC <= coldMaxC
      ? "That is as cold as a working system should be."
      : ventC <= coldMaxC + VENT_C.warmAboveColdK
        ? "That is a little warmer than it should be."
        : "That is much warmer than a working system gives.";
  return {
    fact: `During our test, air from the middle vent was ${ownerTemperature(ventC, units)} on ${withArticle(ownerTemperature(ambientC, units))} day.`,
    meaning,
  };
}

function serviceFacts(facts: OwnerFacts): OwnerFactLine[] {
  const lines: OwnerFactLine[] = [];
  if (facts.holdPassed && facts.holdMinutes !== undefined) {
    lines.push({
      fact: `We pumped the system to a vacuum, and it held for ${Math.round(facts.holdMinutes)} minutes.`,
      meaning: "That shows there is no large leak, and that the system is dry enough to fill.",
    });
  }
  if (facts.oilAddedMl !== undefined && facts.oilAddedMl > 0) {
    lines.push({
      fact: `We added ${ownerVolume(facts.oilAddedMl, facts.units)} of compressor oil.`,
      meaning: "That replaces the oil that came out with the old refrigerant and parts.",
    });
  }
  return lines;
}

export function safetyLines(facts: OwnerFacts): string[] {
  const lines: string[] = [];
  if (facts.refrigerant === "R-1234yf")
    lines.push(
      "Your car uses R-1234yf. It can catch fire in rare cases, so only trained staff with certified tools should work on it.",
    );
  if (facts.refrigerant === "R-744")
    lines.push(
      "Your car uses R-744, which runs at very high pressure. Only trained staff should work on it.",
    );
  if (facts.electricCompressor)
    lines.push(
      "Your car's compressor runs on high voltage from the drive battery. Only trained staff should work on it.",
    );
  lines.push(
    "Please do not add refrigerant from a store can. The amount must be weighed, and some cans hold sealers that can block the system.",
    "Refrigerant that sprays out can freeze skin and hurt eyes. Leave the A/C pipes to trained staff.",
    "We follow the car maker's steps, local rules and certified practice.",
  );
  return lines;
}

export function repairLine(id: RepairId, facts: OwnerFacts): OwnerRepairLine {
  const entry = REPAIR_CATALOG[id];
  return { id, title: entry.ownerTitle, involves: entry.ownerInvolves(facts) };
}

const iso = (value: Date | string) => new Date(value).toISOString();

export function proposalView(proposal: ProposalRecord, facts: OwnerFacts): OwnerProposalView {
  return {
    id: proposal.id,
    repairs: proposal.repairIds.filter(isRepairId).map((id) => repairLine(id, facts)),
    price: proposal.priceMinor === null ? null : formatPrice(proposal.priceMinor, proposal.currency),
    note: proposal.note || null,
    proposedAt: iso(proposal.createdAt),
    answer:
      proposal.answer && proposal.answeredAt
        ? { answer: proposal.answer, note: proposal.answerNote || null, answeredAt: iso(proposal.answeredAt) }
        : null,
  };
}

/** The owner's page, e-mail and PDF content from one case. Pure: every string is plain text. */
export function buildOwnerSummary(input: OwnerSummaryInput): OwnerSummary {
  const { facts } = input;
  const cause = ownerCause(input.conclusionCause, input.findings);
  const text = cause ? OWNER_CAUSES[cause] : null;
  const charge = chargeFacts(facts, cause);
  const vent = ventFact(facts);
  const factLines = [...charge.lines, ...(vent ? [vent] : []), ...serviceFacts(facts)];
  const done = input.repairsDone.map((id) => repairLine(id, facts));
  const proposal = input.proposal ? proposalView(input.proposal, facts) : null;
  const check = nextCheckId(input.findings);
  const nextCheck =
    check && input.status !== "closed" && done.length === 0 && !proposal ? OWNER_CHECKS[check] : null;
  const watch = [
    ...(text ? [text.watch] : []),
    ...(done.length > 0
      ? ["Run the A/C for a few minutes each month, even in winter. This keeps the seals from drying out."]
      : []),
  ];
  const found = text
    ? {
        title: text.title,
        sections: [
          { heading: "What it is", text: text.what(facts) },
          { heading: "How it feels", text: text.comfort },
          { heading: "The compressor", text: text.compressor(facts) },
          { heading: "Safety", text: text.safety(facts) },
          { heading: "The repair", text: text.repair(facts) },
        ],
      }
    : null;
  const summary: OwnerSummary = {
    shopName: input.shopName,
    vehicle: input.vehicle,
    keySentence:
      charge.key && (cause === "undercharge" || cause === "overcharge")
        ? charge.key
        : (text?.headline ?? "We checked your A/C system."),
    reported: input.complaint,
    found,
    facts: factLines,
    done,
    proposal,
    nextCheck,
    watch,
    safety: safetyLines(facts),
    glossary: [],
  };
  summary.glossary = termsUsedIn(ownerSummaryWords(summary)).map(({ term, explanation }) => ({
    term,
    explanation,
  }));
  return summary;
}

/** Every sentence we wrote for the owner (not what the owner or the shop typed), joined. */
export function ownerSummaryWords(summary: OwnerSummary): string {
  return [
    summary.keySentence,
    summary.found?.title,
    ...(summary.found?.sections.map((s) => s.text) ?? []),
    ...summary.facts.flatMap((f) => [f.fact, f.meaning]),
    ...summary.done.flatMap((r) => [r.title, r.involves]),
    ...(summary.proposal?.repairs.flatMap((r) => [r.title, r.involves]) ?? []),
    summary.nextCheck?.title,
    summary.nextCheck?.text,
    ...summary.watch,
    ...summary.safety,
  ]
    .filter((s): s is string => Boolean(s))
    .join("\n");
}
