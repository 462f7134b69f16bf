import { can, type Role } from "@/lib/auth/roles";
import type { RefrigerantId } from "@/lib/refrigerants";
import { endSentence } from "@/lib/units/clock";

// The service record's rules, in one place: who may save or remove it and when, which cylinder may
// take part, and what a version conflict says. The server refuses with `message`; the page shows
// `notice` in place of the save button before anyone tries.

export interface RecordActor {
  id: string;
  role: Role;
}

export interface RecordFacts {
  caseStatus: string;
  /** the vehicle's refrigerant; null while the case has no vehicle */
  refrigerant: RefrigerantId | null;
  /** who started the record, or null when there is none yet */
  startedBy: { id: string; name?: string } | null;
}

export interface RecordRefusal {
  code: "forbidden:service" | "forbidden:service_record" | "conflict:case";
  /** the server's answer to an attempt */
  message: string;
  /** what the page says instead of offering to save */
  notice: string;
}

type Check = (actor: RecordActor, facts: RecordFacts) => RecordRefusal | null;

// Recovering and charging refrigerant is certified work: the roles without service:write read the record.
const mayEnterRecords: Check = (actor) =>
  can(actor.role, "service:write")
    ? null
    : {
        code: "forbidden:service",
        message: "Your role does not allow this.",
        notice: "Your role can read this record; a technician or senior enters it.",
      };

const caseOpen: Check = (_actor, facts) =>
  facts.caseStatus === "closed"
    ? {
        code: "conflict:case",
        message: "This case is closed; its service record can no longer change.",
        notice: "This case is closed: its service record is kept as it was saved.",
      }
    : null;

const vehicleRecorded: Check = (_actor, facts) =>
  facts.refrigerant
    ? null
    : {
        code: "conflict:case",
        message: "Record the vehicle on the case before its service record.",
        notice: "Record the vehicle on the case before its service record.",
      };

/** Only the technician who started the record, a senior or the owner changes a record someone has started. */
const starterOrSenior: Check = (actor, facts) =>
  !facts.startedBy || facts.startedBy.id === actor.id || actor.role === "owner" || actor.role === "senior"
    ? null
    : {
        code: "forbidden:service_record",
        message: "Only the technician who started this record, or a senior, can change it.",
        notice: `${facts.startedBy.name ?? "Another technician"} started this record; only they or a senior can change it.`,
      };

const CHECKS = {
  save: [mayEnterRecords, caseOpen, vehicleRecorded, starterOrSenior],
  remove: [mayEnterRecords, caseOpen, starterOrSenior],
} as const satisfies Record<string, readonly Check[]>;

export type RecordAction = keyof typeof CHECKS;

/** Why this person may not save (or remove) the record now, or null when they may. */
export function serviceRecordRefusal(
  action: RecordAction,
  actor: RecordActor,
  facts: RecordFacts,
): RecordRefusal | null {
  for (const check of CHECKS[action]) {
    const refusal = check(actor, facts);
    if (refusal) return refusal;
  }
  return null;
}

export interface CylinderFacts {
  id: number;
  refrigerant: string;
  kind: "recovery" | "virgin" | "recycled";
  retired: boolean;
}

/**
 * Why this cylinder cannot take part in the record, or null. `previousId` is the cylinder the record
 * already names: a cylinder retired since may stay on the record it served.
 */
export function cylinderProblem(
  cylinder: CylinderFacts | null,
  use: { purpose: "recovery" | "charge"; refrigerant: RefrigerantId; previousId: number | null },
): string | null {
  if (!cylinder) return "Not a cylinder of this shop.";
  if (cylinder.refrigerant !== use.refrigerant)
    return `That cylinder holds ${cylinder.refrigerant}; this vehicle uses ${use.refrigerant}. Never mix refrigerants.`;
  if (use.purpose === "recovery" && cylinder.kind !== "recovery")
    return "Recover only into a recovery cylinder.";
  if (use.purpose === "charge" && cylinder.kind === "recovery")
    return "Charge only from a virgin or recycled-refrigerant cylinder, never from a recovery cylinder.";
  if (cylinder.retired && cylinder.id !== use.previousId) return "That cylinder is retired.";
  return null;
}

const KEPT = "what you typed here is kept on this device.";

/** What a save or removal at a stale version says; `changedAt` is the time on the shop's clock, when known. */
export const RECORD_CONFLICT = {
  changed: (changedAt?: string) =>
    `This record was changed on another screen${changedAt ? ` at ${endSentence(changedAt)}` : "."} Reload to see it; ${KEPT}`,
  removed: `This record was removed on another screen. Reload; ${KEPT}`,
  started: `This record was started on another screen. Reload; ${KEPT}`,
  beforeRemoving: "This record was changed on another screen. Reload before removing it.",
} as const;
