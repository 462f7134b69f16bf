import type { OwnerSummary } from "@/lib/contracts/owner-summary";
import { escapeHtml } from "./html";

/** The owner summary e-mail: a short text with the key sentence and the link, in text and HTML. */
export function ownerSummaryEmail({
  summary,
  link,
  expiresOn,
}: {
  summary: OwnerSummary;
  link: string;
  expiresOn: string;
}): { subject: string; text: string; html: string } {
  const vehicle = summary.vehicle ? `your ${summary.vehicle}` : "your vehicle";
  const subject = `${summary.shopName}: what we found on ${vehicle}`.slice(0, 200);
  const proposalLine = summary.proposal
    ? summary.proposal.answer
      ? "You have already answered our repair proposal. Thank you."
      : `We propose a repair${summary.proposal.price ? ` for ${summary.proposal.price}` : ""}. You can approve or decline it on the page.`
    : null;
  const lines = [
    "Hello,",
    "",
    `We have looked at the air conditioning on ${vehicle}.`,
    "",
    summary.keySentence,
    "",
    "You told us:",
    summary.reported,
    "",
    ...(proposalLine ? [proposalLine, ""] : []),
    "Read the full explanation, with photos, here:",
    link,
    "",
    `The link works until ${expiresOn}. You can print the page or save it as a PDF.`,
    "",
    summary.shopName,
  ];
  const text = lines.join("\n");
  const p = (s: string) => `<p style="margin:0 0 12px">${escapeHtml(s)}</p>`;
  const html = [
    '<!doctype html><html lang="en"><body style="font-family:Arial,sans-serif;font-size:16px;line-height:1.5;color:#0b1620">',
    p("Hello,"),
    p(`We have looked at the air conditioning on ${vehicle}.`),
    `<p style="margin:0 0 12px;font-weight:bold">${escapeHtml(summary.keySentence)}</p>`,
    p("You told us:"),
    `<blockquote style="margin:0 0 12px;padding-left:12px;border-left:3px solid #8aa">${escapeHtml(summary.reported)}</blockquote>`,
    ...(proposalLine ? [p(proposalLine)] : []),
    `<p style="margin:0 0 12px"><a href="${escapeHtml(link)}">Read the full explanation, with photos</a></p>`,
    p(`The link works until ${expiresOn}. You can print the page or save it as a PDF.`),
    p(summary.shopName),
    "</body></html>",
  ].join("\n");
  return { subject, text, html };
}
