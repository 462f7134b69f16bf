import { describe, expect, it } from "vitest";
import { CAUTION_IDS, CAUTION_LEVELS, CAUTIONS, cautionNamed, cautionsById, isCautionId } from "./catalog";

describe("the caution catalogue", () => {
  it("spells every id one way: lower-case words joined by underscores", () => {
    for (const id of CAUTION_IDS) expect(id).toMatch(/^[a-z0-9]+(_[a-z0-9]+)*$/);
  });

  it("gives every caution a level, a title, plain text and the source it rests on", () => {
    for (const id of CAUTION_IDS) {
      const c = CAUTIONS[id];
      expect(c.id).toBe(id);
      expect(CAUTION_LEVELS).toContain(c.level);
      expect(c.title.length, id).toBeGreaterThan(3);
      expect(c.text.length, id).toBeGreaterThan(20);
      expect(c.source.length, id).toBeGreaterThan(5);
    }
  });

  it("never writes the level into the text: the screen shows it by its own mark", () => {
    for (const id of CAUTION_IDS)
      expect(CAUTIONS[id].text, id).not.toMatch(/^(caution|danger|warning|note|notice)\b/i);
  });

  it("hands out cautions by id in the order asked, and knows its own ids", () => {
    expect(cautionsById(["defer_to_procedure", "eye_and_skin"]).map((c) => c.id)).toEqual([
      "defer_to_procedure",
      "eye_and_skin",
    ]);
    expect(isCautionId("eye_and_skin")).toBe(true);
    expect(isCautionId("eye-and-skin")).toBe(false);
    expect(isCautionId("toString")).toBe(false);
  });

  it("reads a caution named elsewhere by id in the catalogue's words, and keeps an unknown one as a notice", () => {
    expect(cautionNamed("empty_system", "another wording")).toBe(CAUTIONS.empty_system);
    expect(cautionNamed("new_engine_caution", "Its own text.")).toEqual({
      id: "new_engine_caution",
      level: "notice",
      text: "Its own text.",
    });
  });
});
