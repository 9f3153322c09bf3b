/**
 * The calculation package as PDF bytes (pdfkit, fonts shipped in the app). Deterministic: the
 * creation date is the revision's, the document info holds nothing else that changes, and pdfkit's
 * file ID is a hash of that info, so the same revision always gives the same bytes.
 */
import { CAUTION } from '../../../shared/engine/types';
import { isApproved, revisionLabel, stampText, type PackageData } from './package-data';
import {
  drawCaution,
  drawChecks,
  drawCover,
  drawInputs,
  drawLoads,
  drawNotes,
  drawSchedule,
} from './package-sections';
import { drawDiagrams } from './pdf-diagrams';
import { drawPlateSketch } from './pdf-sketch';
import { CONTENT_WIDTH, MUTED, PAGE, PdfWriter } from './pdf-writer';

function stampAndFooter(w: PdfWriter, d: PackageData): void {
  const doc = w.doc;
  const range = doc.bufferedPageRange();
  const stamp = stampText(d);
  const approved = isApproved(d);
  for (let i = range.start; i < range.start + range.count; i++) {
    doc.switchToPage(i);
    // Drawing in the margins must not start a new page.
    const bottom = doc.page.margins.bottom;
    doc.page.margins.bottom = 0;
    const colour = approved ? '#1a7f37' : '#b42318';
    doc.rect(PAGE.left, 26, CONTENT_WIDTH, 24).lineWidth(1.2).strokeColor(colour).stroke();
    w.text(
      stamp,
      { bold: true, size: 12, color: colour, width: CONTENT_WIDTH, align: 'center' },
      PAGE.left,
      31,
    );
    const y = PAGE.height - PAGE.bottom + 14;
    doc
      .moveTo(PAGE.left, y - 4)
      .lineTo(PAGE.left + CONTENT_WIDTH, y - 4)
      .lineWidth(0.4)
      .strokeColor(MUTED)
      .stroke();
    w.text(
      `${d.projectName} / ${d.cantileverName} / ${revisionLabel(d)} (${d.revision.reviewState}) / ${stamp}`,
      { size: 7.5, width: CONTENT_WIDTH - 80 },
      PAGE.left,
      y,
    );
    w.text(
      `Page ${i + 1 - range.start} of ${range.count}`,
      { size: 7.5, width: 80, align: 'right' },
      PAGE.left + CONTENT_WIDTH - 80,
      y,
    );
    w.text(CAUTION, { size: 7, color: MUTED, width: CONTENT_WIDTH }, PAGE.left, y + 12);
    doc.page.margins.bottom = bottom;
  }
}

/** Builds the package; resolves to the PDF bytes. */
export async function buildPackagePdf(d: PackageData): Promise<Buffer> {
  const created = new Date(d.revision.createdAt);
  const w = new PdfWriter({
    Title: `Calculation package: ${d.cantileverName}, ${revisionLabel(d)}`,
    Author: d.revision.author,
    Subject: `${d.projectName}: ${stampText(d)}`,
    Keywords: `Reachline; input ${d.inputSha256}; result ${d.resultSha256}`,
    Creator: `Reachline engine ${d.engineVersion}`,
    Producer: 'Reachline',
    CreationDate: created,
    ModDate: created,
  });
  drawCover(w, d);
  w.doc.addPage();
  drawCaution(w);
  drawInputs(w, d);
  w.doc.addPage();
  drawLoads(w, d);
  w.heading('Diagrams');
  drawDiagrams(w, d.result);
  w.doc.addPage();
  drawChecks(w, d);
  if (d.layout) {
    w.doc.addPage();
    w.heading('Plate, rods and pier');
    drawPlateSketch(w, d.input, d.layout);
  }
  drawSchedule(w, d);
  drawNotes(w, d);
  stampAndFooter(w, d);
  return w.finish();
}
