import type PDFDocument from 'pdfkit';
import SVGtoPDF from 'svg-to-pdfkit';
import { pdfText } from './pdf-text';

type Doc = InstanceType<typeof PDFDocument>;

/** Room kept at the top of a page for the running header and the "not for construction" band. */
const HEADER_Y = 16;

/**
 * Draws an SVG drawing at the cursor, as wide as the page's text allows and never taller than the
 * room left on the page: a drawing cut at the page edge loses its axis titles and legend. When less
 * than `minHeight` points are left, it starts a new page first. Moves the cursor below the drawing.
 * Returns the scale used (page points per drawing unit).
 */
export function drawSceneToFit(
  doc: Doc,
  svg: string,
  size: { width: number; height: number },
  { minHeight }: { minHeight: number },
): number {
  const { margins } = doc.page;
  const contentWidth = doc.page.width - margins.left - margins.right;
  const bottom = doc.page.height - margins.bottom;
  if (bottom - doc.y < Math.min(minHeight, size.height * (contentWidth / size.width))) doc.addPage();
  const room = bottom - doc.y - 4;
  const scale = Math.min(contentWidth / size.width, room / size.height);
  const width = size.width * scale;
  const height = size.height * scale;
  const top = doc.y;
  SVGtoPDF(doc, pdfText(svg), margins.left + (contentWidth - width) / 2, top, {
    width,
    height,
    preserveAspectRatio: 'xMidYMid meet',
    fontCallback: (_family, bold) => (bold ? 'Helvetica-Bold' : 'Helvetica'),
  });
  doc.x = margins.left;
  doc.y = top + height + 4;
  return scale;
}

/**
 * A running header on every page after the first (the first carries the title block): which
 * report this page belongs to, so a loose page can be put back. The document must be made with
 * `bufferPages: true`.
 */
export function headEveryPage(doc: Doc, title: string): void {
  const { start, count } = doc.bufferedPageRange();
  for (let i = start + 1; i < start + count; i++) {
    doc.switchToPage(i);
    const margins = { ...doc.page.margins };
    // Writing in the margin must not start a new page.
    doc.page.margins = { top: 0, bottom: 0, left: 0, right: 0 };
    // Leaves the right-hand 310 points to the "not for construction" band.
    doc
      .font('Helvetica')
      .fontSize(7.5)
      .fillColor('#4b6b78')
      .text(pdfText(title), margins.left, HEADER_Y, {
        width: doc.page.width - margins.left - margins.right - 310,
        lineBreak: false,
        ellipsis: true,
      });
    doc.page.margins = margins;
  }
}
