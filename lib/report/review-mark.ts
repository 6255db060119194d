import type PDFDocument from 'pdfkit';
import { NOT_FOR_CONSTRUCTION, type ReviewStamp } from '../review/stamp';
import { pdfText } from './pdf-text';

type Doc = InstanceType<typeof PDFDocument>;
const MARK = '#b9462f';

/**
 * Footer on every page naming the revision and its status; a page that may not be built from also
 * gets a boxed "not for construction" band at the top and a faint diagonal mark across it. The
 * document must be made with `bufferPages: true`.
 */
export function markEveryPage(doc: Doc, stamp: ReviewStamp): void {
  const { start, count } = doc.bufferedPageRange();
  for (let i = start; i < start + count; i++) {
    doc.switchToPage(i);
    // Writing in the margins must not start a new page.
    const margins = { ...doc.page.margins };
    doc.page.margins = { top: 0, bottom: 0, left: 0, right: 0 };
    const { width, height } = doc.page;
    doc
      .font('Helvetica')
      .fontSize(7.5)
      .fillColor('#4b6b78')
      .text(
        pdfText(`${stamp.revisionLabel} \u00b7 ${stamp.statusLabel} \u00b7 page ${i - start + 1} of ${count}`),
        margins.left,
        height - margins.bottom + 14,
        { width: width - margins.left - margins.right, align: 'right', lineBreak: false },
      );
    if (!stamp.forConstruction) {
      const band = `${NOT_FOR_CONSTRUCTION} \u2014 ${stamp.markReason ?? 'not approved'}`;
      doc.save();
      doc
        .rect(width - margins.right - 300, 10, 300, 20)
        .lineWidth(1.5)
        .strokeColor(MARK)
        .stroke();
      doc
        .font('Helvetica-Bold')
        .fontSize(10)
        .fillColor(MARK)
        .text(pdfText(band), width - margins.right - 300, 16, { width: 300, align: 'center', lineBreak: false });
      doc
        .rotate(-25, { origin: [width / 2, height / 2] })
        .font('Helvetica-Bold')
        .fontSize(64)
        .fillColor(MARK)
        .fillOpacity(0.08)
        .text(NOT_FOR_CONSTRUCTION, 0, height / 2 - 32, { width, align: 'center', lineBreak: false });
      doc.restore();
    }
    doc.page.margins = margins;
  }
}
