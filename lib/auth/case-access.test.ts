import { describe, expect, it } from "vitest";
import { caseIsEditable, mayChangeCase } from "./case-access";

describe("who may change a case, and when", () => {
  const caseOf = (technicianId: string) => ({ technicianId });
  it("lets the case's own technician, a senior or the owner change it, and no other technician or apprentice", () => {
    expect(mayChangeCase({ id: "a1", role: "apprentice" }, caseOf("a1"))).toBe(true);
    expect(mayChangeCase({ id: "t2", role: "technician" }, caseOf("a1"))).toBe(false);
    expect(mayChangeCase({ id: "a3", role: "apprentice" }, caseOf("a1"))).toBe(false);
    expect(mayChangeCase({ id: "s1", role: "senior" }, caseOf("a1"))).toBe(true);
    expect(mayChangeCase({ id: "o1", role: "owner" }, caseOf("a1"))).toBe(true);
  });

  it("keeps a submitted case closed until a senior sends it back", () => {
    expect(caseIsEditable({ status: "draft" })).toBe(true);
    expect(caseIsEditable({ status: "sent_back" })).toBe(true);
    for (const status of ["awaiting_signoff", "signed_off", "closed"])
      expect(caseIsEditable({ status })).toBe(false);
  });
});
