import { can, type Permission, type Role } from "@/lib/auth/roles";
import type { CaseStatus } from "./statuses";

// The case's rules, in one place: who may do what to a case, in which status, and where each step
// leads. Pages ask `caseAbilities` what to offer; the server asks `caseRefusal` before it changes a
// case and answers with the refusal's code and message. Nothing else restates these rules.
//
//   draft ──submit──▶ awaiting_signoff ──sign_off──▶ signed_off ──close──▶ closed
//     │   (apprentice)        │                         ▲                   │
//     │                       └──send_back──▶ sent_back │◀──────reopen──────┘
//     └──submit (anyone else: signed off at once)───────┘
//   sent_back ──submit──▶ awaiting_signoff or signed_off, as from draft

export const CASE_ACTIONS = [
  "edit",
  "work_on",
  "submit",
  "sign_off",
  "send_back",
  "close",
  "reopen",
] as const;
/**
 * edit: change the interview's answers; work_on: photos, repair proposal, owner page and e-mail (in
 * any status); submit: the technician's conclusion; sign_off / send_back: a second person's verdict;
 * close: the work is done; reopen: a closed case goes back to signed off.
 */
export type CaseAction = (typeof CASE_ACTIONS)[number];

export interface CaseActor {
  id: string;
  role: Role;
}

export interface CaseFacts {
  status: CaseStatus;
  technicianId: string;
  /**
   * Everyone who saved the case's interview or submitted its conclusion (null or missing: nobody
   * recorded, as on cases from before this was kept).
   */
  conclusionWriterIds?: readonly string[] | null;
}

export interface CaseRefusal {
  code: "forbidden:case" | "conflict:case";
  message: string;
}

/** One check: null when it passes, else why not. */
type Check = (actor: CaseActor, facts: CaseFacts) => CaseRefusal | null;

const forbidden = (message: string): CaseRefusal => ({ code: "forbidden:case", message });
const conflict = (message: string): CaseRefusal => ({ code: "conflict:case", message });

const MESSAGES = {
  permission: "Your role cannot do this to a case.",
  notTheirs: "Only the case's technician, a senior or the owner can change this case.",
  submitted: "This case has been submitted; a senior must send it back before it can change.",
  notWaiting: "This case is not waiting for sign-off.",
  ownCase: "A second person signs off: you cannot sign off your own case.",
  ownConclusion:
    "You saved this case's interview or submitted its conclusion, so it is partly your work: a second person who did neither signs it off.",
  notSignedOff: "Only a signed-off case can be closed.",
  notClosed: "Only a closed case can be reopened.",
} as const;

const permitted =
  (permission: Permission): Check =>
  (actor) =>
    can(actor.role, permission) ? null : forbidden(MESSAGES.permission);

/** The case's own technician may change it, and so may a senior or the owner. */
const theirsOrSenior: Check = (actor, facts) =>
  facts.technicianId === actor.id || actor.role === "owner" || actor.role === "senior"
    ? null
    : forbidden(MESSAGES.notTheirs);

const inStatus =
  (statuses: readonly CaseStatus[], message: string): Check =>
  (_actor, facts) =>
    statuses.includes(facts.status) ? null : conflict(message);

/** Statuses in which the interview may still change; a submitted case waits for a verdict. */
export const EDITABLE_CASE_STATUSES: readonly CaseStatus[] = ["draft", "sent_back"];

const notOwnCase: Check = (actor, facts) =>
  facts.technicianId === actor.id ? forbidden(MESSAGES.ownCase) : null;

/** Nobody signs off a conclusion they wrote or changed, whoever's case it is. */
const notOwnConclusion: Check = (actor, facts) =>
  facts.conclusionWriterIds?.includes(actor.id) ? forbidden(MESSAGES.ownConclusion) : null;

/** The writers after this person saves the interview or submits: each person once, in order. */
export function conclusionWritersWith(
  writers: readonly string[] | null | undefined,
  actorId: string,
): string[] {
  const list = [...(writers ?? [])];
  return list.includes(actorId) ? list : [...list, actorId];
}

/** Whether this refusal is the one that keeps a writer from signing off their own conclusion. */
export function isOwnConclusionRefusal(refusal: CaseRefusal | null): boolean {
  return refusal?.message === MESSAGES.ownConclusion;
}

/**
 * Each action's checks, run in order; the first that fails is the answer. To add a rule, add a line
 * to the action's list (as `notOwnConclusion`: nobody signs off a conclusion they wrote or changed).
 */
const CHECKS: Record<CaseAction, readonly Check[]> = {
  edit: [permitted("cases:write"), theirsOrSenior, inStatus(EDITABLE_CASE_STATUSES, MESSAGES.submitted)],
  work_on: [permitted("cases:write"), theirsOrSenior],
  submit: [permitted("cases:write"), theirsOrSenior, inStatus(EDITABLE_CASE_STATUSES, MESSAGES.submitted)],
  sign_off: [
    permitted("signoff:review"),
    inStatus(["awaiting_signoff"], MESSAGES.notWaiting),
    notOwnCase,
    notOwnConclusion,
  ],
  send_back: [permitted("signoff:review"), inStatus(["awaiting_signoff"], MESSAGES.notWaiting), notOwnCase],
  close: [permitted("cases:write"), theirsOrSenior, inStatus(["signed_off"], MESSAGES.notSignedOff)],
  reopen: [permitted("signoff:review"), inStatus(["closed"], MESSAGES.notClosed)],
};

/** Why this person may not do this to the case now, or null when they may. */
export function caseRefusal(action: CaseAction, actor: CaseActor, facts: CaseFacts): CaseRefusal | null {
  for (const check of CHECKS[action]) {
    const refusal = check(actor, facts);
    if (refusal) return refusal;
  }
  return null;
}

export function mayDo(action: CaseAction, actor: CaseActor, facts: CaseFacts): boolean {
  return caseRefusal(action, actor, facts) === null;
}

export type CaseAbilities = Record<CaseAction, boolean>;

/** Everything this person may do to the case now: what a page offers. */
export function caseAbilities(actor: CaseActor, facts: CaseFacts): CaseAbilities {
  return Object.fromEntries(
    CASE_ACTIONS.map((action) => [action, mayDo(action, actor, facts)]),
  ) as CaseAbilities;
}

/** Where a submission leads: an apprentice's waits for a second person; anyone else's is signed off at once. */
export function statusAfterSubmit(technicianRole: Role | null): "awaiting_signoff" | "signed_off" {
  return technicianRole === "apprentice" ? "awaiting_signoff" : "signed_off";
}

/**
 * Whether the owner's page may show the case: once its diagnosis stands. Signed off or closed, it
 * stands; waiting for sign-off, it stands only where its technician's submission needs no second
 * person (statusAfterSubmit), and a case whose technician is not known waits for the verdict.
 */
export function ownerMayViewCase(status: CaseStatus, technicianRole: Role | null): boolean {
  if (status === "signed_off" || status === "closed") return true;
  return (
    status === "awaiting_signoff" &&
    technicianRole !== null &&
    statusAfterSubmit(technicianRole) === "signed_off"
  );
}

/** Where each of the other steps leads. */
export const STATUS_AFTER = {
  sign_off: "signed_off",
  send_back: "sent_back",
  close: "closed",
  // A reopened case goes back to signed off, not to the technician's draft: a second person already
  // checked the diagnosis, and a reopen questions the outcome (the repair did not hold, or the wrong
  // cause was recorded). The technician records the outcome again and closes it; a diagnosis wrong from
  // the start is a new case, which the casebook links to this one as a comeback.
  reopen: "signed_off",
} as const satisfies Record<Exclude<CaseAction, "edit" | "work_on" | "submit">, CaseStatus>;

/** The verdicts a second person gives, as the actions they are. */
export const VERDICT_ACTION = { signed_off: "sign_off", sent_back: "send_back" } as const;
