import type { Message } from "./messages";

/**
 * What the findings show first on a phone: the leading causes, each with one whole-percent share, and one
 * line for the rest, the integers adding up to exactly 100; and for each cause its strongest reasons.
 * Pure, so the rules can be read and tested apart from the screen.
 */

/**
 * The leading-cause rule (our judgement, not a published figure): the first cause always leads; the next
 * one joins while the causes so far hold less than `coverShare` of the likelihood and it holds at least
 * `minShare` itself; never more than `maxCauses`. A cause trailing at a few percent is never "leading".
 */
export const LEADING_RULE = { coverShare: 0.8, minShare: 0.1, maxCauses: 3 } as const;

/**
 * The reasons shown per side of a cause: always up to two, a third only when it carries at least
 * `thirdFromFraction` of the strongest one's weight (our judgement: a minor third reason is clutter).
 */
export const REASONS_RULE = { always: 2, most: 3, thirdFromFraction: 0.25 } as const;

/**
 * Whole numbers proportional to `shares` that add up to exactly `total` (largest remainder): each part
 * gets the floor of its quota, and the points left go to the largest remainders (ties: the larger share,
 * then the earlier part). A part with a share above zero is then never shown as 0 while the total allows:
 * it takes a point from the largest part, so a trailing remainder never reads as "nothing" and the leader
 * never reads as "all". Negative or non-finite shares count as 0; all zero gives all zeros.
 */
export function apportion(shares: readonly number[], total = 100): number[] {
  const clean = shares.map((s) => (Number.isFinite(s) && s > 0 ? s : 0));
  const sum = clean.reduce((a, b) => a + b, 0);
  if (sum === 0 || total <= 0) return clean.map(() => 0);
  const quotas = clean.map((s) => (s / sum) * total);
  const whole = quotas.map((q) => Math.floor(q));
  let left = total - whole.reduce((a, b) => a + b, 0);
  const order = quotas
    .map((q, i) => ({ i, remainder: q - Math.floor(q), share: clean[i] ?? 0 }))
    // Stryker disable next-line ArithmeticOperator: the parts start in index order and the sort is stable (ES2019)
    .sort((a, b) => b.remainder - a.remainder || b.share - a.share || a.i - b.i);
  for (const { i } of order) {
    if (left <= 0) break;
    whole[i] = (whole[i] ?? 0) + 1;
    left -= 1;
  }
  const positive = clean.filter((s) => s > 0).length;
  if (positive <= total) {
    // Stryker disable next-line EqualityOperator: one past the end reads undefined, taken as a share of 0
    for (let i = 0; i < whole.length; i++) {
      if ((clean[i] ?? 0) === 0 || whole[i] !== 0) continue;
      const donor = largestIndex(whole);
      // Stryker disable next-line ConditionalExpression: unreachable while positive <= total: with a part at 0, the others hold at least one point more than their number, so the largest holds 2
      if ((whole[donor] ?? 0) < 2) break;
      whole[donor] = (whole[donor] ?? 0) - 1;
      whole[i] = 1;
    }
  }
  return whole;
}

function largestIndex(values: readonly number[]): number {
  let best = 0;
  for (let i = 1; i < values.length; i++) if ((values[i] ?? 0) > (values[best] ?? 0)) best = i;
  return best;
}

/** How many of the ranked shares (highest first) lead, by LEADING_RULE; 0 only for an empty list. */
export function leadingCount(
  rankedShares: readonly number[],
  rule: { coverShare: number; minShare: number; maxCauses: number } = LEADING_RULE,
): number {
  if (rankedShares.length === 0) return 0;
  let count = 1;
  let covered = rankedShares[0] ?? 0;
  while (count < Math.min(rule.maxCauses, rankedShares.length)) {
    const next = rankedShares[count] ?? 0;
    if (covered >= rule.coverShare || next < rule.minShare) break;
    covered += next;
    count += 1;
  }
  return count;
}

export interface RankedCause<S> {
  suspect: S;
  /** whole percent, as shown */
  percent: number;
}

export interface FirstScreenRanking<S> {
  leading: RankedCause<S>[];
  /** The other causes in rank order, each with its whole percent of the rest (they add up to `restPercent`). */
  others: RankedCause<S>[];
  /** The rest's whole percent: with the leading percents it adds up to exactly 100 (0 with nothing left). */
  restPercent: number;
  /** Whether any of the others could be judged at all (false after a failed identification). */
  othersAssessed: boolean;
}

interface Ranked {
  share?: number;
  /** stored before shares: the independent score */
  score?: number;
  assessed?: boolean;
}

const shareOf = (s: Ranked) => s.share ?? s.score ?? 0;

/**
 * Split ranked suspects (highest share first, as the engine returns them) into the leading causes and
 * the rest, with the shown percents: leading and rest add up to 100, the others add up to the rest.
 */
export function firstScreenRanking<S extends Ranked>(suspects: readonly S[]): FirstScreenRanking<S> {
  const count = leadingCount(suspects.map(shareOf));
  const lead = suspects.slice(0, count);
  const rest = suspects.slice(count);
  const restShare = rest.reduce((a, s) => a + shareOf(s), 0);
  const shown = apportion([...lead.map(shareOf), restShare]);
  // Stryker disable next-line ConditionalExpression: with no rest its share is 0, and apportion gives a share of 0 no point
  const restPercent = rest.length === 0 ? 0 : (shown[count] ?? 0);
  const otherPercents = apportion(rest.map(shareOf), restPercent);
  return {
    leading: lead.map((suspect, i) => ({ suspect, percent: shown[i] ?? 0 })),
    others: rest.map((suspect, i) => ({ suspect, percent: otherPercents[i] ?? 0 })),
    restPercent,
    othersAssessed: rest.some((s) => s.assessed !== false),
  };
}

export interface WeighedReason<M> {
  message: M;
  /** natural-log likelihood ratio: above 0 speaks for the cause, below 0 against it */
  weight: number;
}

export interface Reasons<M> {
  for: M[];
  against: M[];
  /** reasons on each side not among the strongest */
  moreFor: M[];
  moreAgainst: M[];
}

interface ReasonsRule {
  always: number;
  most: number;
  thirdFromFraction: number;
}

function strongest<M>(items: readonly WeighedReason<M>[], rule: ReasonsRule): [M[], M[]] {
  const sorted = [...items].sort((a, b) => Math.abs(b.weight) - Math.abs(a.weight));
  const top = Math.abs(sorted[0]?.weight ?? 0);
  let take = Math.min(rule.always, sorted.length);
  while (take < Math.min(rule.most, sorted.length)) {
    // Stryker disable next-line OptionalChaining: take stays below the list's length here
    if (Math.abs(sorted[take]?.weight ?? 0) < top * rule.thirdFromFraction) break;
    take += 1;
  }
  return [sorted.slice(0, take).map((r) => r.message), sorted.slice(take).map((r) => r.message)];
}

interface WithReasons<M> {
  evidenceFor: readonly M[];
  evidenceAgainst: readonly M[];
  /** every item with its weight; absent on findings stored before weights were kept */
  evidence?: readonly WeighedReason<M>[];
}

/**
 * A cause's strongest reasons for and against, by the weight each carried (REASONS_RULE). Findings
 * stored without weights keep the engine's order (already strongest first) and show up to two a side.
 */
export function strongestReasons<M = Message>(
  suspect: WithReasons<M>,
  rule: ReasonsRule = REASONS_RULE,
): Reasons<M> {
  if (!suspect.evidence) {
    return {
      for: suspect.evidenceFor.slice(0, rule.always),
      against: suspect.evidenceAgainst.slice(0, rule.always),
      moreFor: suspect.evidenceFor.slice(rule.always),
      moreAgainst: suspect.evidenceAgainst.slice(rule.always),
    };
  }
  const [forTop, forMore] = strongest(
    suspect.evidence.filter((e) => e.weight > 0),
    rule,
  );
  const [againstTop, againstMore] = strongest(
    suspect.evidence.filter((e) => e.weight < 0),
    rule,
  );
  return { for: forTop, against: againstTop, moreFor: forMore, moreAgainst: againstMore };
}
