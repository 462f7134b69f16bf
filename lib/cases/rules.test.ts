import { describe, expect, it } from "vitest";
import { ROLES, type Role } from "@/lib/auth/roles";
import { CASE_STATUSES, type CaseStatus } from "./statuses";
import {
  CASE_ACTIONS,
  STATUS_AFTER,
  caseAbilities,
  caseRefusal,
  conclusionWritersWith,
  isOwnConclusionRefusal,
  ownerMayViewCase,
  statusAfterSubmit,
  type CaseAction,
} from "./rules";

// Letters for the actions a person may take: E edit, W work on (photos, proposal, owner page),
// S submit, O sign off, B send back, C close, R reopen. Written out by hand for every role, on their
// own case and on someone else's, in every status, so a changed rule shows up here as a changed cell.
const LETTER: Record<CaseAction, string> = {
  edit: "E",
  work_on: "W",
  submit: "S",
  sign_off: "O",
  send_back: "B",
  close: "C",
  reopen: "R",
};

type Row = Record<CaseStatus, string>;
const EXPECTED: Record<`${Role}/${"own" | "other"}`, Row> = {
  "owner/own": { draft: "EWS", awaiting_signoff: "W", signed_off: "WC", sent_back: "EWS", closed: "WR" },
  "owner/other": { draft: "EWS", awaiting_signoff: "WOB", signed_off: "WC", sent_back: "EWS", closed: "WR" },
  "senior/own": { draft: "EWS", awaiting_signoff: "W", signed_off: "WC", sent_back: "EWS", closed: "WR" },
  "senior/other": { draft: "EWS", awaiting_signoff: "WOB", signed_off: "WC", sent_back: "EWS", closed: "WR" },
  "technician/own": { draft: "EWS", awaiting_signoff: "W", signed_off: "WC", sent_back: "EWS", closed: "W" },
  "technician/other": { draft: "", awaiting_signoff: "", signed_off: "", sent_back: "", closed: "" },
  "apprentice/own": { draft: "EWS", awaiting_signoff: "W", signed_off: "WC", sent_back: "EWS", closed: "W" },
  "apprentice/other": { draft: "", awaiting_signoff: "", signed_off: "", sent_back: "", closed: "" },
};

describe("the case's rules", () => {
  it("say, for every role × own or other's case × status, exactly which actions are allowed", () => {
    for (const role of ROLES)
      for (const whose of ["own", "other"] as const)
        for (const status of CASE_STATUSES) {
          const facts = { status, technicianId: whose === "own" ? "me" : "someone-else" };
          const may = caseAbilities({ id: "me", role }, facts);
          const letters = CASE_ACTIONS.filter((a) => may[a])
            .map((a) => LETTER[a])
            .join("");
          expect(letters, `${role} on ${whose} case, ${status}`).toBe(EXPECTED[`${role}/${whose}`][status]);
        }
  });

  it("refuse with 403 who may never do it and 409 what the status does not allow, in that order for changes", () => {
    const other = { id: "t2", role: "technician" as const };
    const owner = { id: "o1", role: "owner" as const };
    expect(caseRefusal("edit", other, { status: "awaiting_signoff", technicianId: "a1" })).toEqual({
      code: "forbidden:case",
      message: "Only the case's technician, a senior or the owner can change this case.",
    });
    expect(caseRefusal("edit", owner, { status: "awaiting_signoff", technicianId: "a1" })).toEqual({
      code: "conflict:case",
      message: "This case has been submitted; a senior must send it back before it can change.",
    });
  });

  it("answer a verdict on a case not waiting for one with 409 before looking at whose case it is", () => {
    const senior = { id: "s1", role: "senior" as const };
    expect(caseRefusal("sign_off", senior, { status: "draft", technicianId: "s1" })?.code).toBe(
      "conflict:case",
    );
    expect(caseRefusal("sign_off", senior, { status: "awaiting_signoff", technicianId: "s1" })).toEqual({
      code: "forbidden:case",
      message: "A second person signs off: you cannot sign off your own case.",
    });
    expect(
      caseRefusal(
        "send_back",
        { id: "t1", role: "technician" },
        { status: "awaiting_signoff", technicianId: "a1" },
      )?.code,
    ).toBe("forbidden:case");
  });

  it("send an apprentice's submission to sign-off and sign anyone else's off at once", () => {
    expect(statusAfterSubmit("apprentice")).toBe("awaiting_signoff");
    for (const role of ["technician", "senior", "owner"] as const)
      expect(statusAfterSubmit(role)).toBe("signed_off");
    // No technician found for the case reads as "not an apprentice", as it always has.
    expect(statusAfterSubmit(null)).toBe("signed_off");
  });

  it("open the owner's page once the diagnosis stands: at once for a non-apprentice, after sign-off for an apprentice", () => {
    const open = (role: Role | null) => CASE_STATUSES.filter((status) => ownerMayViewCase(status, role));
    expect(open("apprentice")).toEqual(["signed_off", "closed"]);
    for (const role of ["technician", "senior", "owner"] as const)
      expect(open(role)).toEqual(["awaiting_signoff", "signed_off", "closed"]);
    // Waiting for sign-off with no technician known: the verdict is still to come.
    expect(open(null)).toEqual(["signed_off", "closed"]);
  });

  it("lead each verdict and the closing steps to the status the brief names", () => {
    expect(STATUS_AFTER).toEqual({
      sign_off: "signed_off",
      send_back: "sent_back",
      close: "closed",
      reopen: "signed_off",
    });
  });
});

describe("nobody signs off a conclusion they wrote or changed", () => {
  // Who wrote the conclusion of an apprentice's case waiting for sign-off, and whether each role may
  // then sign it off: only a reviewer who neither owns the case nor saved or submitted it.
  const WRITERS = {
    nobody: [] as string[],
    "the apprentice only": ["a1"],
    "me and the apprentice": ["a1", "me"],
    "only me": ["me"],
    "not recorded": null,
  } as const;
  const MAY_SIGN_OFF: Record<Role, Record<keyof typeof WRITERS, boolean>> = {
    owner: {
      nobody: true,
      "the apprentice only": true,
      "me and the apprentice": false,
      "only me": false,
      "not recorded": true,
    },
    senior: {
      nobody: true,
      "the apprentice only": true,
      "me and the apprentice": false,
      "only me": false,
      "not recorded": true,
    },
    technician: {
      nobody: false,
      "the apprentice only": false,
      "me and the apprentice": false,
      "only me": false,
      "not recorded": false,
    },
    apprentice: {
      nobody: false,
      "the apprentice only": false,
      "me and the apprentice": false,
      "only me": false,
      "not recorded": false,
    },
  };

  it("holds for every role × who wrote it", () => {
    for (const role of ROLES)
      for (const [who, writers] of Object.entries(WRITERS) as [keyof typeof WRITERS, string[] | null][]) {
        const facts = {
          status: "awaiting_signoff" as const,
          technicianId: "a1",
          conclusionWriterIds: writers,
        };
        expect(caseAbilities({ id: "me", role }, facts).sign_off, `${role}, written by ${who}`).toBe(
          MAY_SIGN_OFF[role][who],
        );
      }
  });

  it("says why, and still lets the writer send the case back", () => {
    const senior = { id: "s1", role: "senior" as const };
    const facts = {
      status: "awaiting_signoff" as const,
      technicianId: "a1",
      conclusionWriterIds: ["a1", "s1"],
    };
    const refusal = caseRefusal("sign_off", senior, facts);
    expect(refusal?.code).toBe("forbidden:case");
    expect(refusal?.message).toMatch(/saved this case's interview or submitted its conclusion/);
    expect(isOwnConclusionRefusal(refusal)).toBe(true);
    expect(isOwnConclusionRefusal(caseRefusal("sign_off", senior, { ...facts, status: "draft" }))).toBe(
      false,
    );
    expect(caseRefusal("send_back", senior, facts)).toBeNull();
  });

  it("records each writer once, in the order they wrote", () => {
    expect(conclusionWritersWith(null, "a1")).toEqual(["a1"]);
    expect(conclusionWritersWith(["a1"], "s1")).toEqual(["a1", "s1"]);
    expect(conclusionWritersWith(["a1", "s1"], "a1")).toEqual(["a1", "s1"]);
  });
});
