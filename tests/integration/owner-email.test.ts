import { createServer } from "node:net";
import { mkdtempSync, rmSync } from "node:fs";
import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { PDFParse } from "pdf-parse";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeSequelize } from "@/lib/db/sequelize";
import { listEmails, retryEmail, sendOwnerSummaryEmail } from "@/lib/server/outbound-email";
import { publicOwnerSummaryPdf } from "@/lib/server/owner-pdf";
import { ownerSummaryForCase, publicOwnerSummary } from "@/lib/server/owner-summary";
import { answerProposal, proposeRepair } from "@/lib/server/repair-proposals";
import { createShareLink, revokeShareLink } from "@/lib/server/share-links";
import { getModels } from "@/models";
import { OwnerSummaryView } from "@/components/owner/owner-summary-view";
import { readCaught, startMailCatcher, type MailCatcher } from "@/scripts/fakes/mail-catcher";
import "./helpers";
import { createSharedCase } from "./owner-fixtures";

// This file's own mail catcher, on a port of its own, so it can be stopped and started again.
let smtpPort = 0;
let catcher: MailCatcher | null = null;
const mailDir = mkdtempSync("/tmp/cw-itest-mail-");

function freePort(): Promise<number> {
  return new Promise((resolve) => {
    const server = createServer().listen(0, "127.0.0.1", () => {
      const { port } = server.address() as { port: number };
      server.close(() => resolve(port));
    });
  });
}

beforeAll(async () => {
  smtpPort = await freePort();
  process.env.SMTP_URL = `smtp://127.0.0.1:${smtpPort}`;
  catcher = await startMailCatcher({ smtpPort, dir: mailDir });
});

afterAll(async () => {
  await catcher?.close();
  rmSync(mailDir, { recursive: true, force: true });
  await closeSequelize();
});

const HOSTILE = `<b>Warm</b> at idle <script>alert("x")</script> & "loud" <img src=x onerror=alert(1)>`;

describe("owner summary by e-mail", () => {
  it("keeps a message while the mail server is down, shows the failure, and sends it on retry", async () => {
    const { user, serviceCase } = await createSharedCase(getModels());
    await catcher!.close();
    catcher = null;
    const failed = await sendOwnerSummaryEmail({
      user,
      caseId: serviceCase.id,
      input: { to: "owner@example.test" },
    });
    expect(failed.status).toBe("failed");
    expect(failed.lastError).toMatch(/did not take the message.*ECONNREFUSED/);
    const onCase = await listEmails({ shopId: user.shopId, caseId: serviceCase.id });
    expect(onCase).toEqual([expect.objectContaining({ id: failed.id, status: "failed", attempts: 1 })]);

    catcher = await startMailCatcher({ smtpPort, dir: mailDir });
    const sent = await retryEmail({ user, caseId: serviceCase.id, emailId: failed.id });
    expect(sent).toMatchObject({ status: "sent", attempts: 2, lastError: null });
    const caught = readCaught(mailDir).filter((m) => m.to.includes("owner@example.test"));
    expect(caught).toHaveLength(1);
    const link = caught[0]!.text.match(/http:\/\/\S+\/s\/([A-Za-z0-9_-]{43})/);
    expect(link).not.toBeNull();
    // The delivered link works; the token stored nowhere but in its hash.
    const page = await publicOwnerSummary(link![1]!);
    expect(page.summary.keySentence).toBe(
      "The system held about a quarter more refrigerant than the maker specifies.",
    );
    const hashes = await getModels().ShareLink.findAll({ where: { caseId: serviceCase.id }, raw: true });
    expect(JSON.stringify(hashes)).not.toContain(link![1]!);
    // A second retry of a sent message is refused.
    await expect(retryEmail({ user, caseId: serviceCase.id, emailId: failed.id })).rejects.toMatchObject({
      status: 409,
    });
  });

  it("shows text a person typed as text on the owner page, in the e-mail and in the PDF", async () => {
    const { user, serviceCase } = await createSharedCase(getModels(), HOSTILE);
    await proposeRepair({
      user,
      caseId: serviceCase.id,
      input: {
        repairIds: ["recover_evacuate_recharge"],
        priceMinor: 18900,
        currency: "CAD",
        note: "<i>Thursday</i>",
      },
    });
    const email = await sendOwnerSummaryEmail({
      user,
      caseId: serviceCase.id,
      input: { to: "hostile@example.test" },
    });
    expect(email.status).toBe("sent");
    const message = readCaught(mailDir).find((m) => m.to.includes("hostile@example.test"))!;
    expect(message.text).toContain(HOSTILE);
    expect(message.html).not.toContain("<script>");
    expect(message.html).toContain("&lt;script&gt;alert(&quot;x&quot;)&lt;/script&gt;");
    expect(message.html).not.toMatch(/<img src=x/);

    const token = message.text.match(/\/s\/([A-Za-z0-9_-]{43})/)![1]!;
    const bundle = await publicOwnerSummary(token);
    // Answered first, so the page draws the answer and not the (browser-only) answer form.
    await answerProposal({
      token,
      input: { proposalId: bundle.summary.proposal!.id, answer: "declined", note: "<u>later</u>" },
    });
    const answered = await publicOwnerSummary(token);
    const html = renderToStaticMarkup(
      createElement(OwnerSummaryView, { token, summary: answered.summary, photos: answered.photos }),
    );
    expect(html).not.toContain("<script>");
    expect(html).toContain("&lt;b&gt;Warm&lt;/b&gt;");
    expect(html).toContain("&lt;i&gt;Thursday&lt;/i&gt;");
    expect(html).toContain("&lt;u&gt;later&lt;/u&gt;");

    const { pdf } = await publicOwnerSummaryPdf(token);
    const text = (await new PDFParse({ data: new Uint8Array(pdf) }).getText()).text.replace(/\s+/g, " ");
    expect(text).toContain("The system held about a quarter more refrigerant than the maker specifies.");
    expect(text).toContain(`<b>Warm</b> at idle <script>alert("x")</script>`);
    expect(text).toContain("<i>Thursday</i>");
  });

  it("records the owner's answer once, with its time and the link it came through, and an audit row", async () => {
    const models = getModels();
    const { user, serviceCase } = await createSharedCase(models);
    const { id: proposalId } = await proposeRepair({
      user,
      caseId: serviceCase.id,
      input: { repairIds: ["recover_evacuate_recharge"], priceMinor: null },
    });
    const link = await createShareLink({ user, caseId: serviceCase.id, expiresInDays: 30 });
    const answers = await Promise.allSettled([
      answerProposal({ token: link.token, input: { proposalId, answer: "approved", note: "Go ahead" } }),
      answerProposal({ token: link.token, input: { proposalId, answer: "declined" } }),
    ]);
    expect(answers.filter((a) => a.status === "fulfilled")).toHaveLength(1);
    const refused = answers.find((a) => a.status === "rejected") as PromiseRejectedResult;
    expect(refused.reason).toMatchObject({
      status: 409,
      message: "This proposal has already been answered.",
    });
    const stored = await models.RepairProposal.findByPk(proposalId, { raw: true });
    expect(stored).toMatchObject({ answeredViaLinkId: link.id });
    expect(stored?.answeredAt).toBeInstanceOf(Date);
    const audit = await models.AuditEvent.findAll({
      where: { shopId: user.shopId, entityId: String(serviceCase.id) },
      raw: true,
    });
    expect(audit.map((a) => a.action)).toEqual(
      expect.arrayContaining(["repair_proposed", "share_link_created"]),
    );
    expect(audit.some((a) => a.action === "owner_approved" || a.action === "owner_declined")).toBe(true);
    const shop = await ownerSummaryForCase({ shopId: user.shopId, caseId: serviceCase.id });
    expect(shop.summary.proposal?.answer).not.toBeNull();
  });

  it("answers 'no longer valid' after a revoke, for another shop's case, and once expired", async () => {
    const models = getModels();
    const { user, serviceCase } = await createSharedCase(models);
    const link = await createShareLink({ user, caseId: serviceCase.id, expiresInDays: 30 });
    await expect(publicOwnerSummary(link.token)).resolves.toBeDefined();
    await revokeShareLink({ user, caseId: serviceCase.id, linkId: link.id });
    await expect(publicOwnerSummary(link.token)).rejects.toMatchObject({
      status: 404,
      message: expect.stringMatching(/no longer valid/),
    });

    const other = await createSharedCase(models);
    await expect(
      revokeShareLink({ user, caseId: other.serviceCase.id, linkId: link.id }),
    ).rejects.toMatchObject({ status: 404 });

    const old = await createShareLink({ user, caseId: serviceCase.id, expiresInDays: 1 });
    await models.ShareLink.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { id: old.id } });
    await expect(publicOwnerSummary(old.token)).rejects.toMatchObject({ status: 404 });
  });

  it("keeps the page closed until an apprentice's case is signed off", async () => {
    const models = getModels();
    const { user, serviceCase, technician } = await createSharedCase(models);
    await technician.update({ role: "apprentice" });
    await serviceCase.update({ status: "awaiting_signoff" });
    await expect(
      sendOwnerSummaryEmail({
        user: { ...user, role: "apprentice" },
        caseId: serviceCase.id,
        input: { to: "a@example.test" },
      }),
    ).rejects.toMatchObject({ status: 409 });
    const link = await createShareLink({ user, caseId: serviceCase.id, expiresInDays: 1 });
    await expect(publicOwnerSummary(link.token)).rejects.toMatchObject({ status: 404 });
  });
});
