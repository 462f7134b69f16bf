import { describe, expect, it } from "vitest";
import { ROLES } from "@/lib/auth/roles";
import { cylinderProblem, serviceRecordRefusal, type RecordFacts } from "./record-rules";

const open: RecordFacts = { caseStatus: "signed_off", refrigerant: "R-134a", startedBy: null };

describe("the service record's rules", () => {
  it("let the roles that enter records start one, and keep apprentices to reading it", () => {
    const allowed = ROLES.filter((role) => serviceRecordRefusal("save", { id: "me", role }, open) === null);
    expect(allowed).toEqual(["owner", "senior", "technician"]);
    expect(serviceRecordRefusal("save", { id: "me", role: "apprentice" }, open)).toMatchObject({
      code: "forbidden:service",
      notice: "Your role can read this record; a technician or senior enters it.",
    });
  });

  it("leave a started record to the one who started it, a senior or the owner", () => {
    const started: RecordFacts = { ...open, startedBy: { id: "t1", name: "Priya" } };
    expect(serviceRecordRefusal("save", { id: "t1", role: "technician" }, started)).toBeNull();
    expect(serviceRecordRefusal("save", { id: "s1", role: "senior" }, started)).toBeNull();
    expect(serviceRecordRefusal("save", { id: "o1", role: "owner" }, started)).toBeNull();
    const refusal = serviceRecordRefusal("save", { id: "t2", role: "technician" }, started);
    expect(refusal).toEqual({
      code: "forbidden:service_record",
      message: "Only the technician who started this record, or a senior, can change it.",
      notice: "Priya started this record; only they or a senior can change it.",
    });
    expect(serviceRecordRefusal("remove", { id: "t2", role: "technician" }, started)?.code).toBe(
      "forbidden:service_record",
    );
  });

  it("keep a closed case's record as it was, and ask for the vehicle before a record", () => {
    const senior = { id: "s1", role: "senior" as const };
    expect(serviceRecordRefusal("save", senior, { ...open, caseStatus: "closed" })?.message).toBe(
      "This case is closed; its service record can no longer change.",
    );
    expect(serviceRecordRefusal("remove", senior, { ...open, caseStatus: "closed" })?.code).toBe(
      "conflict:case",
    );
    expect(serviceRecordRefusal("save", senior, { ...open, refrigerant: null })?.message).toBe(
      "Record the vehicle on the case before its service record.",
    );
    // Removing needs no vehicle: a record can always be taken back while the case is open.
    expect(serviceRecordRefusal("remove", senior, { ...open, refrigerant: null })).toBeNull();
  });

  it("take a cylinder only of the vehicle's refrigerant and the right kind, and no retired one newly", () => {
    const recovery = { id: 7, refrigerant: "R-134a", kind: "recovery" as const, retired: false };
    const virgin = { id: 8, refrigerant: "R-134a", kind: "virgin" as const, retired: false };
    const use = (purpose: "recovery" | "charge", previousId: number | null = null) => ({
      purpose,
      refrigerant: "R-134a" as const,
      previousId,
    });
    expect(cylinderProblem(recovery, use("recovery"))).toBeNull();
    expect(cylinderProblem(virgin, use("charge"))).toBeNull();
    expect(cylinderProblem(null, use("recovery"))).toBe("Not a cylinder of this shop.");
    expect(cylinderProblem({ ...recovery, refrigerant: "R-1234yf" }, use("recovery"))).toMatch(
      /holds R-1234yf; this vehicle uses R-134a\. Never mix refrigerants/,
    );
    expect(cylinderProblem(virgin, use("recovery"))).toBe("Recover only into a recovery cylinder.");
    expect(cylinderProblem(recovery, use("charge"))).toMatch(/never from a recovery cylinder/);
    expect(cylinderProblem({ ...virgin, retired: true }, use("charge"))).toBe("That cylinder is retired.");
    expect(cylinderProblem({ ...virgin, retired: true }, use("charge", 8))).toBeNull();
  });
});

describe("the service record's refusals, whole", () => {
  it("say the same three parts for each refusal: the code, the message and the page's notice", () => {
    const senior = { id: "s1", role: "senior" as const };
    expect(serviceRecordRefusal("save", { id: "a1", role: "apprentice" }, open)).toEqual({
      code: "forbidden:service",
      message: "Your role does not allow this.",
      notice: "Your role can read this record; a technician or senior enters it.",
    });
    expect(serviceRecordRefusal("save", senior, { ...open, caseStatus: "closed" })).toEqual({
      code: "conflict:case",
      message: "This case is closed; its service record can no longer change.",
      notice: "This case is closed: its service record is kept as it was saved.",
    });
    expect(serviceRecordRefusal("save", senior, { ...open, refrigerant: null })).toEqual({
      code: "conflict:case",
      message: "Record the vehicle on the case before its service record.",
      notice: "Record the vehicle on the case before its service record.",
    });
  });

  it("names another technician when the starter's name is unknown", () => {
    const started: RecordFacts = { ...open, startedBy: { id: "t1" } };
    expect(serviceRecordRefusal("save", { id: "t2", role: "technician" }, started)?.notice).toBe(
      "Another technician started this record; only they or a senior can change it.",
    );
  });
});
