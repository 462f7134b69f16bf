import { describe, expect, it } from "vitest";
import { changePasswordFormSchema, changePasswordSchema, passwordEmailProblem } from "./passwords";

describe("passwordEmailProblem", () => {
  it("refuses a password built from the e-mail address or its name part, in any case", () => {
    expect(passwordEmailProblem("ines.okafor2026!", "Ines.Okafor@harbourline.test")).toMatch(
      /e-mail address/,
    );
    expect(
      passwordEmailProblem("xx-INES.OKAFOR@HARBOURLINE.TEST", "ines.okafor@harbourline.test"),
    ).not.toBeNull();
  });

  it("accepts a password that does not contain them, and ignores a name part too short to matter", () => {
    expect(passwordEmailProblem("copper-valve-lantern", "ines.okafor@harbourline.test")).toBeNull();
    expect(passwordEmailProblem("bob-the-copper-valve", "bob@harbourline.test")).toBeNull();
  });
});

describe("changePasswordSchema", () => {
  it("wants 12 characters at least and a new password that differs from the current one", () => {
    const short = changePasswordSchema.safeParse({ currentPassword: "old-password-1", newPassword: "short" });
    expect(short.error?.issues[0]?.message).toBe("Use at least 12 characters.");
    const same = changePasswordSchema.safeParse({
      currentPassword: "the-same-password",
      newPassword: "the-same-password",
    });
    expect(same.error?.issues[0]?.message).toBe("The new password is the same as the current one.");
    const missing = changePasswordSchema.safeParse({ newPassword: "copper-valve-lantern" });
    expect(missing.error?.issues[0]?.message).toBe("Your current password is missing.");
  });

  it("the form also wants the new password twice, the same both times", () => {
    const differs = changePasswordFormSchema.safeParse({
      currentPassword: "old-password-1",
      newPassword: "copper-valve-lantern",
      newPasswordAgain: "copper-valve-lanterm",
    });
    expect(differs.error?.issues.map((i) => i.message)).toEqual(["The two new passwords differ."]);
  });
});
