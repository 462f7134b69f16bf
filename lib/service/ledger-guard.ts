import type { MassUnit } from "@/lib/units";
import { formatMassGrouped } from "@/lib/units/quantity";
import {
  type Cylinder,
  type CylinderMovement,
  RECOVERY_CYLINDER_FILL_LIMIT_PCT,
  activeMovements,
  movementEffectG,
} from "./ledger";
import { formatPercent } from "./format";
import { SERVICE_SOURCES } from "./sources";

/**
 * The most a cylinder may hold, grams. A recovery cylinder stops at 80 % of its rated refrigerant
 * capacity (common practice, SERVICE_SOURCES.recoveryCylinderFill); a supply cylinder at its rated
 * capacity. The capacity is already a refrigerant mass, so no liquid density is needed here.
 */
export function safeFillG(cylinder: Pick<Cylinder, "kind" | "capacityG">): number {
  const pct = cylinder.kind === "recovery" ? RECOVERY_CYLINDER_FILL_LIMIT_PCT : 100;
  return Math.floor((cylinder.capacityG * pct) / 100);
}

/** Why a change to the ledger was refused, as quantities; the screen words it in its reader's units. */
export interface LedgerRefusal {
  reason: "below_empty" | "over_fill";
  cylinderId: string;
  /** the moment the cylinder would be worst off; the latest line's time when that is now */
  atIso: string;
  /** true when the worst moment is the cylinder's present contents */
  now: boolean;
  /** what the ledger says the cylinder held at that moment, without the change (grams) */
  beforeG: number;
  /** what it would hold with the change (grams) */
  afterG: number;
  /** 0 for below_empty; the safe fill for over_fill (grams) */
  limitG: number;
  capacityG: number;
  kind: Cylinder["kind"];
  source: string;
}

interface Step {
  atMs: number;
  deltaG: number;
}

function steps(cylinder: Cylinder, movements: readonly CylinderMovement[]): Step[] {
  // A correction takes its line out of the history, as if it had never been posted: the
  // cylinder's past is replayed from the lines still in force, so an edit that moves a
  // figure by a few grams is never judged against both the old and the new figure at once.
  return activeMovements(movements)
    .filter((m) => m.cylinderId === cylinder.id)
    .map((m) => ({ atMs: Date.parse(m.at), deltaG: movementEffectG(m) }));
}

/** Balance after every distinct moment, oldest first (grams), starting from the initial contents. */
function balances(cylinder: Cylinder, list: Step[], moments: number[]): number[] {
  const sorted = [...list].sort((a, b) => a.atMs - b.atMs);
  const out: number[] = [];
  let i = 0;
  let netG = cylinder.initialNetG;
  for (const t of moments) {
    while (i < sorted.length && sorted[i]!.atMs <= t) netG += sorted[i++]!.deltaG;
    out.push(netG);
  }
  return out;
}

/**
 * Would adding `added` (new lines, corrections among them) to a cylinder's `existing` lines take
 * it below empty or past its safe fill at any moment from the change on? A change may not push
 * the contents past a bound, nor further past one the ledger already crossed; a change that
 * moves a wrong ledger back towards the truth is always allowed. Returns the worst moment, or null.
 */
export function checkLedgerChange(
  cylinder: Cylinder,
  existing: readonly CylinderMovement[],
  added: readonly CylinderMovement[],
): LedgerRefusal | null {
  const before = steps(cylinder, existing);
  const after = steps(cylinder, [...existing, ...added]);
  const moments = [...new Set([...before, ...after].map((s) => s.atMs))].sort((a, b) => a - b);
  if (moments.length === 0) return null;
  const was = balances(cylinder, before, moments);
  const will = balances(cylinder, after, moments);
  const limitG = safeFillG(cylinder);
  let worst: { i: number; reason: LedgerRefusal["reason"]; byG: number } | null = null;
  for (let i = 0; i < moments.length; i++) {
    const w = will[i]!;
    const b = was[i]!;
    if (w < 0 && w < b && (!worst || -w > worst.byG)) worst = { i, reason: "below_empty", byG: -w };
    if (w > limitG && w > b && (!worst || w - limitG > worst.byG))
      worst = { i, reason: "over_fill", byG: w - limitG };
  }
  if (!worst) return null;
  return {
    reason: worst.reason,
    cylinderId: cylinder.id,
    atIso: new Date(moments[worst.i]!).toISOString(),
    now: worst.i === moments.length - 1,
    beforeG: was[worst.i]!,
    afterG: will[worst.i]!,
    limitG: worst.reason === "below_empty" ? 0 : limitG,
    capacityG: cylinder.capacityG,
    kind: cylinder.kind,
    source: SERVICE_SOURCES.recoveryCylinderFill,
  };
}

const dayFormatters = new Map<string, Intl.DateTimeFormat>();
function dayIn(atIso: string, timeZone: string): string {
  let f = dayFormatters.get(timeZone);
  if (!f) {
    f = new Intl.DateTimeFormat("en-GB", { timeZone, day: "numeric", month: "short", year: "numeric" });
    dayFormatters.set(timeZone, f);
  }
  return f.format(new Date(atIso));
}

/** Cylinders are weighed in pounds by a reader of ounces (common practice); metric readers keep their unit. */
export function ledgerMassUnit(readerMass: MassUnit): MassUnit {
  return readerMass === "oz" ? "lb" : readerMass;
}

/** A mass in the reader's unit, with thousands separators: "4,660 g", "10.27 lb". */
const massIn = formatMassGrouped;

/** The refusal in plain words, every mass in the reader's unit and the date on the shop's calendar. */
export function ledgerRefusalMessage(
  refusal: LedgerRefusal,
  opts: { cylinderLabel: string; massUnit: MassUnit; timeZone: string },
): string {
  const m = (g: number) => massIn(g, opts.massUnit);
  const changeG = Math.abs(refusal.afterG - refusal.beforeG);
  const when = refusal.now ? "" : ` on ${dayIn(refusal.atIso, opts.timeZone)}`;
  const held = refusal.now ? "It holds" : "It held";
  if (refusal.reason === "below_empty") {
    return (
      `Refused: ${opts.cylinderLabel} would go below empty${when}. ` +
      `${held} ${m(refusal.beforeG)} and this takes out ${m(changeG)}. ` +
      "Weigh the cylinder; if the scale disagrees with the ledger, post a weighed correction first."
    );
  }
  const limit =
    refusal.kind === "recovery"
      ? `its safe fill of ${m(refusal.limitG)} (${RECOVERY_CYLINDER_FILL_LIMIT_PCT} % of ${m(refusal.capacityG)})`
      : `its capacity of ${m(refusal.capacityG)}`;
  const advice =
    refusal.kind === "recovery"
      ? "Overfilled cylinders can burst: recover into another cylinder with room."
      : "Check the figure and the cylinder.";
  return (
    `Refused: ${opts.cylinderLabel} would be filled past ${limit}${when}. ` +
    `${held} ${m(refusal.beforeG)} and this adds ${m(changeG)}. ${advice}`
  );
}

/** "52.3 % full; 3.20 lb of room before the 80 % limit." in the reader's unit. */
export function fillSentence(
  fill: { fillPct: number; limitPct: number; roomG: number },
  massUnit: MassUnit,
): string {
  const pct = `${formatPercent(fill.fillPct)} full`;
  return fill.roomG >= 0
    ? `${pct}; ${massIn(fill.roomG, massUnit)} of room before the ${fill.limitPct} % limit.`
    : `${pct}: ${massIn(-fill.roomG, massUnit)} past the ${fill.limitPct} % limit. Stop filling this cylinder and change to an empty one.`;
}
