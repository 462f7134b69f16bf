import { escapeHtml } from "./html";

/** The invitation to join a shop: who invites, as what, and the link to choose a password. */
export function invitationEmail({
  shopName,
  name,
  roleLabel,
  link,
  validDays,
}: {
  shopName: string;
  name: string;
  roleLabel: string;
  link: string;
  validDays: number;
}): { subject: string; text: string; html: string } {
  const subject = `${shopName} invites you to Chillwright`.slice(0, 200);
  const invite = `${shopName} invites you to its Chillwright casebook as ${roleLabel.toLowerCase()}.`;
  const open = `Open this link within ${validDays} days to choose your password:`;
  const ignore =
    "If you did not expect this, ignore this message: nothing happens unless the link is opened.";
  const text = [`${name},`, "", invite, open, "", link, "", ignore].join("\n");
  const p = (s: string) => `<p style="margin:0 0 12px">${escapeHtml(s)}</p>`;
  const html = [
    '<!doctype html><html lang="en"><body style="font-family:Arial,sans-serif;font-size:16px;line-height:1.5;color:#0b1620">',
    p(`${name},`),
    p(invite),
    p(open),
    `<p style="margin:0 0 12px"><a href="${escapeHtml(link)}">Choose your password</a></p>`,
    p(ignore),
    "</body></html>",
  ].join("\n");
  return { subject, text, html };
}
