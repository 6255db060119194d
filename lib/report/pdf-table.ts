import type PDFDocument from 'pdfkit';
import { pdfText } from './pdf-text';

type Doc = InstanceType<typeof PDFDocument>;

export interface PdfColumn {
  heading: string;
  width: number;
  align?: 'left' | 'right';
}

export const INK = '#183d4d';
export const RULE = '#abd2de';
export const SHADE = '#eef6f8';

/** Starts a new page when fewer than `needed` points are left. */
export function ensureRoom(doc: Doc, needed: number): void {
  if (doc.y + needed > doc.page.height - doc.page.margins.bottom) doc.addPage();
}

/** A section heading. */
export function heading(doc: Doc, text: string): void {
  ensureRoom(doc, 60);
  doc.moveDown(0.6).font('Helvetica-Bold').fontSize(12).fillColor(INK).text(pdfText(text), doc.page.margins.left);
  doc.moveDown(0.3);
}

/** A table that wraps cell text and repeats its header on each new page. */
export function table(doc: Doc, columns: readonly PdfColumn[], givenRows: readonly string[][], fontSize = 8.5): void {
  const rows = givenRows.map((row) => row.map(pdfText));
  const left = doc.page.margins.left;
  const pad = 3;
  const drawHeader = () => {
    const y = doc.y;
    const h = fontSize + 2 * pad + 2;
    doc
      .rect(
        left,
        y,
        columns.reduce((s, c) => s + c.width, 0),
        h,
      )
      .fill(SHADE);
    let x = left;
    doc.font('Helvetica-Bold').fontSize(fontSize).fillColor(INK);
    for (const c of columns) {
      doc.text(pdfText(c.heading), x + pad, y + pad, {
        width: c.width - 2 * pad,
        align: c.align ?? 'left',
        lineBreak: false,
        ellipsis: true,
      });
      x += c.width;
    }
    doc.y = y + h;
  };
  drawHeader();
  doc.font('Helvetica').fontSize(fontSize);
  for (const row of rows) {
    const heights = row.map((cell, i) => doc.heightOfString(cell, { width: columns[i].width - 2 * pad }));
    const h = Math.max(...heights) + 2 * pad;
    if (doc.y + h > doc.page.height - doc.page.margins.bottom) {
      doc.addPage();
      drawHeader();
      doc.font('Helvetica').fontSize(fontSize);
    }
    const y = doc.y;
    let x = left;
    doc.fillColor(INK);
    row.forEach((cell, i) => {
      doc.text(cell, x + pad, y + pad, { width: columns[i].width - 2 * pad, align: columns[i].align ?? 'left' });
      x += columns[i].width;
    });
    doc
      .moveTo(left, y + h)
      .lineTo(x, y + h)
      .lineWidth(0.5)
      .strokeColor(RULE)
      .stroke();
    doc.y = y + h;
  }
  doc.x = left;
  doc.moveDown(0.5);
}

/** Label and value pairs in a bordered grid (the title block). */
export function labelGrid(doc: Doc, cells: readonly [string, string][], columns: number, width: number): void {
  const left = doc.page.margins.left;
  const cellWidth = width / columns;
  const rowHeight = 30;
  const top = doc.y;
  cells.forEach(([label, value], i) => {
    const x = left + (i % columns) * cellWidth;
    const y = top + Math.floor(i / columns) * rowHeight;
    doc.rect(x, y, cellWidth, rowHeight).lineWidth(0.7).strokeColor(INK).stroke();
    doc
      .font('Helvetica')
      .fontSize(7)
      .fillColor('#215d75')
      .text(pdfText(label.toUpperCase()), x + 5, y + 4, { width: cellWidth - 10, height: 9, ellipsis: true });
    const fits = doc.font('Helvetica-Bold').fontSize(10).widthOfString(pdfText(value)) <= cellWidth - 10;
    doc
      .fontSize(fits ? 10 : 8)
      .fillColor(INK)
      .text(pdfText(value), x + 5, y + (fits ? 14 : 13), {
        width: cellWidth - 10,
        height: fits ? 12 : 20,
        ellipsis: true,
      });
  });
  doc.x = left;
  doc.y = top + Math.ceil(cells.length / columns) * rowHeight + 8;
}
