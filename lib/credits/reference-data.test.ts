import { describe, expect, it } from "vitest";
import { VAPOUR_PRESSURE_EQUATIONS } from "@/data/refrigerants/equations";
import { OTHER_REFERENCE_DATA, SATURATION_TABLE_PUBLICATIONS } from "./reference-data";

describe("reference data on the credits page", () => {
  it("names, for every bundled saturation table, the publication its source string cites", () => {
    for (const eq of VAPOUR_PRESSURE_EQUATIONS) {
      const publication = SATURATION_TABLE_PUBLICATIONS.find((p) => p.refrigerant === eq.id);
      expect(publication, eq.id).toBeDefined();
      const [firstAuthor] = publication!.citation.split(",");
      const year = publication!.citation.match(/\((\d{4})\)/)?.[1];
      expect(eq.source, eq.id).toContain(firstAuthor!);
      expect(eq.source, eq.id).toContain(`(${year})`);
    }
  });

  it("cites by author, year and where it appeared, with no web address and no quoted title", () => {
    for (const p of [...SATURATION_TABLE_PUBLICATIONS, ...OTHER_REFERENCE_DATA]) {
      expect(p.citation, p.id).not.toMatch(/:\/\/|www\./);
      expect(p.citation, p.id).not.toMatch(/['‘’“”"]/);
    }
  });
});
