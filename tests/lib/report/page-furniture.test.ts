import PDFDocument from 'pdfkit';
import { PDFParse } from 'pdf-parse';
import { describe, expect, it } from 'vitest';
import { drawSceneToFit, headEveryPage } from '../../../lib/report/page-furniture';

const SVG =
  '<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 1000 800" width="1000" height="800"><rect x="0" y="0" width="1000" height="800" fill="#eee"/></svg>';

function landscapeDoc() {
  return new PDFDocument({ size: 'A4', layout: 'landscape', margin: 40, bufferPages: true });
}

async function textOf(doc: InstanceType<typeof PDFDocument>): Promise<string[]> {
  const chunks: Buffer[] = [];
  doc.on('data', (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve) => doc.on('end', () => resolve(Buffer.concat(chunks))));
  doc.end();
  const parser = new PDFParse({ data: new Uint8Array(await done) });
  const result = await parser.getText();
  await parser.destroy();
  return result.pages.map((p) => p.text);
}

describe('report page furniture', () => {
  it('scales a drawing to the room left on the page, so its axis titles and legend are never cut', () => {
    const doc = landscapeDoc();
    doc.y = 200;
    const scale = drawSceneToFit(doc, SVG, { width: 1000, height: 800 }, { minHeight: 150 });
    const bottom = doc.page.height - doc.page.margins.bottom;
    // Full width would be 762/1000 = 0.762 and 610 points tall: far past the bottom from y = 200.
    expect(scale).toBeLessThan(0.762);
    expect(doc.y).toBeLessThanOrEqual(bottom);
    expect(doc.bufferedPageRange().count).toBe(1);
  });

  it('starts a new page when less than the least useful height is left', () => {
    const doc = landscapeDoc();
    doc.y = doc.page.height - doc.page.margins.bottom - 60;
    drawSceneToFit(doc, SVG, { width: 1000, height: 800 }, { minHeight: 250 });
    expect(doc.bufferedPageRange().count).toBe(2);
    expect(doc.y).toBeLessThanOrEqual(doc.page.height - doc.page.margins.bottom);
  });

  it('heads every page after the first with the report it belongs to', async () => {
    const doc = landscapeDoc();
    doc.text('first page');
    doc.addPage().text('second page');
    doc.addPage().text('third page');
    headEveryPage(doc, 'Tarn Rigg intake · line design report');
    const pages = await textOf(doc);
    expect(pages).toHaveLength(3);
    expect(pages[0]).not.toContain('Tarn Rigg intake');
    expect(pages[1]).toContain('Tarn Rigg intake · line design report');
    expect(pages[2]).toContain('Tarn Rigg intake · line design report');
  });
});
