import { describe, expect, it } from "vitest";
import { withPick } from "./complaint-picks";

describe("filling the complaint from a pick", () => {
  it("uses the pick alone on an empty complaint and adds it after written words", () => {
    expect(withPick("", "Blows warm air")).toBe("Blows warm air");
    expect(withPick("Since the spring.", "Blows warm air")).toBe("Since the spring; blows warm air");
  });

  it("does not add the same pick twice", () => {
    expect(withPick("Blows warm air", "Blows warm air")).toBe("Blows warm air");
  });
});
