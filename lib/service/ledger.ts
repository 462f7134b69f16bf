import type { RefrigerantId } from "@/lib/refrigerants";
import { formatPercent, sayGrams } from "./format";
import { SERVICE_SOURCES } from "./sources";

/**
 * recovered_into: refrigerant recovered from a vehicle into the cylinder (+).
 * charged_from: refrigerant charged from the cylinder into a vehicle (−).
 * recycled: refrigerant cleaned in place by the recycling machine; the mass stays (0),
 *   but the monthly report counts it.
 * sent_out: sent for reclaim or destruction; `destination` names the facility (−).
 * adjustment: a weighed correction, signed (±).
 */
export const MOVEMENT_TYPES = [
  "recovered_into",
  "charged_from",
  "recycled",
  "sent_out",
  "adjustment",
] as const;
export type MovementType = (typeof MOVEMENT_TYPES)[number];

export interface CylinderMovement {
  id: string;
  cylinderId: string;
  type: MovementType;
  /** grams; positive except for an adjustment, which carries its sign */
  massG: number;
  /** ISO 8601 instant */
  at: string;
  technicianId: string;
  refrigerant: RefrigerantId;
  serviceRecordId?: string;
  /** set on a correction: the id of the movement it cancels (same type and mass) */
  reverses?: string;
  destination?: string;
  note?: string;
}

export interface Cylinder {
  id: string;
  refrigerant: RefrigerantId;
  kind: "recovery" | "supply";
  /** rated refrigerant capacity, grams */
  capacityG: number;
  tareG: number;
  /** refrigerant in the cylinder when it entered the ledger */
  initialNetG: number;
}

const SIGN: Readonly<Record<MovementType, number>> = {
  recovered_into: 1,
  charged_from: -1,
  recycled: 0,
  sent_out: -1,
  adjustment: 1,
};

/** Change of the cylinder's contents caused by one movement (grams). */
export function movementEffectG(m: CylinderMovement, reversed?: CylinderMovement): number {
  const base = reversed ?? m;
  const effect = SIGN[base.type] * base.massG;
  return m.reverses ? -effect : effect;
}

/** Check a movement list; corrections must cancel one earlier, un-reversed movement of the same kind. */
export function movementProblems(movements: readonly CylinderMovement[]): string[] {
  const problems: string[] = [];
  const byId = new Map<string, CylinderMovement>();
  const reversedIds = new Set<string>();
  for (const m of movements) {
    if (byId.has(m.id)) problems.push(`Movement ${m.id} appears twice.`);
    byId.set(m.id, m);
    if (!Number.isFinite(m.massG) || (m.type !== "adjustment" && m.massG <= 0)) {
      problems.push(`Movement ${m.id}: the mass must be a positive number of grams.`);
    }
    if (Number.isNaN(Date.parse(m.at))) problems.push(`Movement ${m.id}: "${m.at}" is not a date and time.`);
    if (m.type === "sent_out" && !m.reverses && !m.destination?.trim())
      problems.push(`Movement ${m.id}: say where the refrigerant was sent.`);
  }
  for (const m of movements) {
    if (!m.reverses) continue;
    const original = byId.get(m.reverses);
    if (!original) problems.push(`Correction ${m.id} cancels ${m.reverses}, which is not in the ledger.`);
    else if (original.reverses)
      problems.push(`Correction ${m.id} cancels another correction; post a new movement instead.`);
    else if (reversedIds.has(original.id))
      problems.push(`Movement ${original.id} is cancelled more than once.`);
    else if (original.type !== m.type || original.massG !== m.massG || original.cylinderId !== m.cylinderId) {
      problems.push(`Correction ${m.id} does not match the movement it cancels (${original.id}).`);
    }
    if (original) reversedIds.add(original.id);
  }
  return problems;
}

/** Movements still in force: neither cancelled nor a cancellation. */
export function activeMovements(movements: readonly CylinderMovement[]): CylinderMovement[] {
  const reversed = new Set(movements.flatMap((m) => (m.reverses ? [m.reverses] : [])));
  return movements.filter((m) => !m.reverses && !reversed.has(m.id));
}

export interface FillLevel {
  fillPct: number;
  limitPct: number;
  /** room left before the limit, grams (negative when over) */
  roomG: number;
  verdict: "ok" | "over_limit";
  message: string;
  source: string;
}

export const RECOVERY_CYLINDER_FILL_LIMIT_PCT = 80;

/** Recovery cylinders stop at 80 % of capacity; supply cylinders are checked against their full capacity. */
export function fillLevelCheck(cylinder: Cylinder, netG: number): FillLevel {
  const limitPct = cylinder.kind === "recovery" ? RECOVERY_CYLINDER_FILL_LIMIT_PCT : 100;
  const fillPct = (netG / cylinder.capacityG) * 100;
  const roomG = (cylinder.capacityG * limitPct) / 100 - netG;
  const verdict = roomG >= 0 ? "ok" : "over_limit";
  const message =
    verdict === "ok"
      ? `${formatPercent(fillPct)} full; ${sayGrams(roomG)} of room before the ${limitPct} % limit.`
      : `${formatPercent(fillPct)} full: ${sayGrams(-roomG)} past the ${limitPct} % limit. Stop filling this cylinder and change to an empty one.`;
  return { fillPct, limitPct, roomG, verdict, message, source: SERVICE_SOURCES.recoveryCylinderFill };
}

export interface CylinderState {
  netG: number;
  grossG: number;
  fill: FillLevel;
  problems: string[];
}

/** Replay a cylinder's movements in time order: its contents now, and anything that does not add up. */
export function applyMovements(cylinder: Cylinder, movements: readonly CylinderMovement[]): CylinderState {
  const problems = movementProblems(movements);
  const byId = new Map(movements.map((m) => [m.id, m]));
  const own = movements
    .filter((m) => m.cylinderId === cylinder.id)
    .map((m) => ({ m, atMs: Date.parse(m.at) }))
    .sort((a, b) => a.atMs - b.atMs || (a.m.id < b.m.id ? -1 : a.m.id > b.m.id ? 1 : 0))
    .map(({ m }) => m);
  let netG = cylinder.initialNetG;
  let wentBelowEmpty = false;
  for (const m of own) {
    if (m.refrigerant !== cylinder.refrigerant) {
      problems.push(
        `Movement ${m.id} is ${m.refrigerant} but cylinder ${cylinder.id} holds ${cylinder.refrigerant}.`,
      );
    }
    netG += movementEffectG(m, m.reverses ? byId.get(m.reverses) : undefined);
    if (netG < -1e-9 && !wentBelowEmpty) {
      wentBelowEmpty = true;
      problems.push(
        `After movement ${m.id} the cylinder would hold less than nothing: a movement is wrong or missing.`,
      );
    }
  }
  const fill = fillLevelCheck(cylinder, netG);
  if (fill.verdict === "over_limit") problems.push(fill.message);
  return { netG, grossG: cylinder.tareG + netG, fill, problems };
}
