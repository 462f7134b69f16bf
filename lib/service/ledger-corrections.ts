import type { CylinderMovement, MovementType } from "./ledger";

export type PlannedMovement = Pick<
  CylinderMovement,
  "cylinderId" | "type" | "massG" | "refrigerant" | "technicianId"
> &
  Partial<Pick<CylinderMovement, "destination" | "note">>;

function sameMovement(a: PlannedMovement, b: PlannedMovement): boolean {
  return (
    a.cylinderId === b.cylinderId &&
    a.type === b.type &&
    a.massG === b.massG &&
    a.refrigerant === b.refrigerant
  );
}

/**
 * The ledger is append-only. When a service record is edited or deleted, cancel each
 * posting that no longer matches and post what the record now says; postings that still
 * match stay untouched, so re-saving an unchanged record posts nothing.
 */
export function postingsForRecordChange(input: {
  serviceRecordId: string;
  /** movements this record posted that are still in force (see activeMovements) */
  posted: readonly CylinderMovement[];
  /** what the record says now; [] when it is deleted */
  wanted: readonly PlannedMovement[];
  at: string;
  technicianId: string;
  newId: () => string;
}): CylinderMovement[] {
  const remaining = [...input.wanted];
  const out: CylinderMovement[] = [];
  for (const old of input.posted) {
    const i = remaining.findIndex((w) => sameMovement(w, old));
    if (i >= 0) {
      remaining.splice(i, 1);
      continue;
    }
    out.push({
      id: input.newId(),
      cylinderId: old.cylinderId,
      type: old.type,
      massG: old.massG,
      at: input.at,
      technicianId: input.technicianId,
      refrigerant: old.refrigerant,
      serviceRecordId: input.serviceRecordId,
      reverses: old.id,
      note: "service record changed",
    });
  }
  for (const w of remaining) {
    out.push({ ...w, id: input.newId(), at: input.at, serviceRecordId: input.serviceRecordId });
  }
  return out;
}

/** The postings a service record makes: what was recovered into and charged from which cylinder. */
export function postingsForServiceRecord(record: {
  refrigerant: CylinderMovement["refrigerant"];
  technicianId: string;
  recovery?: { cylinderId: string; massG: number } | null;
  recharge?: { cylinderId: string; massG: number } | null;
}): PlannedMovement[] {
  const out: PlannedMovement[] = [];
  const add = (type: MovementType, leg: { cylinderId: string; massG: number } | null | undefined) => {
    if (leg && leg.massG > 0)
      out.push({
        cylinderId: leg.cylinderId,
        type,
        massG: leg.massG,
        refrigerant: record.refrigerant,
        technicianId: record.technicianId,
      });
  };
  add("recovered_into", record.recovery);
  add("charged_from", record.recharge);
  return out;
}
