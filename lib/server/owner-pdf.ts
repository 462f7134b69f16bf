import "server-only";
import path from "node:path";
import PDFDocument from "pdfkit";
import type { OwnerSummary } from "@/lib/contracts/owner-summary";
import { getObject } from "@/lib/storage/s3";
import { getModels } from "@/models";
import { formatDay } from "./outbound-email";
import { publicOwnerSummary } from "./owner-summary";

// The app's own reading font, embedded so the PDF shows °, − and quotes as the page does.
const FONT_DIR = path.join(process.cwd(), "node_modules/@fontsource/atkinson-hyperlegible/files");
const REGULAR = path.join(FONT_DIR, "atkinson-hyperlegible-latin-400-normal.woff");
const BOLD = path.join(FONT_DIR, "atkinson-hyperlegible-latin-700-normal.woff");

export interface PdfPhoto {
  caption: string;
  jpeg: Buffer;
}

/** The owner summary as a PDF: the same sections as the page, every stored string drawn as text. */
export function renderOwnerSummaryPdf({
  summary,
  photos,
  preparedOn,
}: {
  summary: OwnerSummary;
  photos: PdfPhoto[];
  preparedOn: string;
}): Promise<Buffer> {
  const doc = new PDFDocument({
    size: "A4",
    margin: 50,
    info: { Title: `${summary.shopName}: A/C summary`, Author: summary.shopName },
  });
  doc.registerFont("body", REGULAR);
  doc.registerFont("bold", BOLD);
  const chunks: Buffer[] = [];
  doc.on("data", (chunk: Buffer) => chunks.push(chunk));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on("end", () => resolve(Buffer.concat(chunks)));
    doc.on("error", reject);
  });

  const heading = (text: string) => doc.moveDown(0.6).font("bold").fontSize(14).text(text).moveDown(0.2);
  const para = (text: string) => doc.font("body").fontSize(11).text(text, { paragraphGap: 4 });
  const bullet = (text: string) =>
    doc.font("body").fontSize(11).text(`•  ${text}`, { indent: 8, paragraphGap: 3 });

  doc.font("bold").fontSize(18).text(summary.shopName);
  doc
    .font("body")
    .fontSize(11)
    .text(`${summary.vehicle ?? "Your vehicle"} · prepared ${preparedOn}`);
  doc.moveDown(0.6).font("bold").fontSize(13).text(summary.keySentence);

  heading("What you told us");
  para(summary.reported);

  if (summary.found) {
    heading(`What we found: ${summary.found.title}`);
    for (const s of summary.found.sections) {
      doc.font("bold").fontSize(11).text(s.heading);
      para(s.text);
    }
  }
  if (summary.facts.length) {
    heading("The numbers that matter");
    for (const f of summary.facts) bullet(`${f.fact} ${f.meaning}`);
  }
  if (summary.done.length) {
    heading("What we did");
    for (const r of summary.done) bullet(`${r.title}. ${r.involves}`);
  }
  if (summary.proposal) {
    heading("What we propose");
    for (const r of summary.proposal.repairs) bullet(`${r.title}. ${r.involves}`);
    if (summary.proposal.price) para(`Price: ${summary.proposal.price}`);
    if (summary.proposal.note) para(`Note from the shop: ${summary.proposal.note}`);
    const a = summary.proposal.answer;
    if (a)
      para(
        `Your answer: ${a.answer === "approved" ? "approved" : "declined"}${a.note ? ` (“${a.note}”)` : ""}.`,
      );
  }
  if (summary.nextCheck) {
    heading(`What we check next: ${summary.nextCheck.title}`);
    para(summary.nextCheck.text);
  }
  if (summary.watch.length) {
    heading("What to watch for");
    for (const w of summary.watch) bullet(w);
  }
  heading("Safety");
  for (const s of summary.safety) bullet(s);
  if (summary.glossary.length) {
    heading("Words we use");
    for (const g of summary.glossary) bullet(`${g.term}: ${g.explanation}`);
  }
  for (const photo of photos) {
    doc.addPage();
    doc
      .font("bold")
      .fontSize(12)
      .text(photo.caption || "Photo");
    try {
      doc.image(photo.jpeg, { fit: [495, 640] });
    } catch {
      para("(This photo could not be added to the PDF.)");
    }
  }
  doc.end();
  return done;
}

/** The PDF behind a public link: the page's content and its shareable photos. */
export async function publicOwnerSummaryPdf(token: string): Promise<{ pdf: Buffer; caseId: number }> {
  const { summary, caseRow } = await publicOwnerSummary(token);
  const rows = await getModels().Attachment.findAll({
    where: { shopId: caseRow.shopId, caseId: caseRow.id, shareable: true },
    order: [["createdAt", "ASC"]],
  });
  const photos = await Promise.all(
    rows.map(async (row) => ({
      caption: row.caption,
      jpeg: await getObject(row.objectKey).catch(() => Buffer.alloc(0)),
    })),
  );
  const pdf = await renderOwnerSummaryPdf({
    summary,
    photos,
    preparedOn: formatDay(new Date(), caseRow.timeZone),
  });
  return { pdf, caseId: caseRow.id };
}
