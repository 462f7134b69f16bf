import { describe, expect, it } from "vitest";
import { invitationEmail } from "./invitation-email";

describe("invitationEmail", () => {
  const mail = invitationEmail({
    shopName: "Harbourline <Auto> Climate",
    name: `Dana "<script>alert(1)</script>" Okafor`,
    roleLabel: "Senior technician",
    link: "http://127.0.0.1:3000/invitation/abc_DEF-123",
    validDays: 7,
  });

  it("says who invites, as what, for how long, with the link in text and HTML", () => {
    expect(mail.subject).toBe("Harbourline <Auto> Climate invites you to Chillwright");
    expect(mail.text).toContain("as senior technician");
    expect(mail.text).toContain("within 7 days");
    expect(mail.text).toContain("http://127.0.0.1:3000/invitation/abc_DEF-123");
    expect(mail.html).toContain('href="http://127.0.0.1:3000/invitation/abc_DEF-123"');
  });

  it("shows typed names as text in the HTML, never as markup", () => {
    expect(mail.html).not.toContain("<script>");
    expect(mail.html).toContain("&lt;script&gt;");
    expect(mail.html).toContain("Harbourline &lt;Auto&gt; Climate");
  });
});
