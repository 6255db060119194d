import type PDFDocument from 'pdfkit';
import type { PhotoPlacement } from '../../models/site-photo';
import { offLineWords, takenWords } from '../photos/words';
import { formatQuantity, type DisplayUnits } from '../units/index';
import { ensureRoom, heading, INK } from './pdf-table';
import { pdfText } from './pdf-text';

type Doc = InstanceType<typeof PDFDocument>;

/** A site photo chosen for the report: its number along the route, its place and its thumbnail. */
export interface ReportPhoto {
  id: string;
  number: number;
  chainageM: number;
  caption: string;
  fileName: string;
  takenAt: Date | null;
  offsetM: number | null;
  placement: PhotoPlacement;
  latitude: number | null;
  longitude: number | null;
  /** The stored JPEG thumbnail (metadata-free); null when storage no longer has it. */
  thumbnail: Uint8Array | null;
}

const PER_ROW = 4;
const GAP = 12;
const IMAGE_HEIGHT = 118;
const TEXT_HEIGHT = 52;

/**
 * The photos chosen for the report, four to a row in chainage order, each under the number its mark
 * carries on the profile, with chainage, caption, time and distance off the line.
 */
export function photoSection(doc: Doc, photos: readonly ReportPhoto[], u: DisplayUnits): void {
  if (photos.length === 0) return;
  heading(doc, `Site photos (${photos.length})`);
  const left = doc.page.margins.left;
  const width = doc.page.width - left - doc.page.margins.right;
  const cell = (width - GAP * (PER_ROW - 1)) / PER_ROW;
  for (let start = 0; start < photos.length; start += PER_ROW) {
    ensureRoom(doc, IMAGE_HEIGHT + TEXT_HEIGHT + 6);
    const top = doc.y;
    photos.slice(start, start + PER_ROW).forEach((p, k) => {
      const x = left + k * (cell + GAP);
      if (p.thumbnail)
        doc.image(Buffer.from(p.thumbnail), x, top, { fit: [cell, IMAGE_HEIGHT], align: 'center', valign: 'center' });
      else
        doc
          .font('Helvetica')
          .fontSize(8)
          .fillColor(INK)
          .text('(image no longer stored)', x, top + IMAGE_HEIGHT / 2, { width: cell, align: 'center' });
      const lines = [
        `Photo ${p.number} \u00b7 ${formatQuantity('chainage', p.chainageM, u.system)}`,
        p.caption || p.fileName,
        `Taken ${takenWords(p.takenAt)}; ${offLineWords(p, u.system)}`,
      ];
      doc
        .font('Helvetica-Bold')
        .fontSize(8.5)
        .fillColor(INK)
        .text(pdfText(lines[0]), x, top + IMAGE_HEIGHT + 4, { width: cell });
      doc.font('Helvetica').fontSize(8).text(pdfText(lines[1]), { width: cell, height: 20, ellipsis: true });
      doc.text(pdfText(lines[2]), { width: cell, height: 20, ellipsis: true });
    });
    doc.x = left;
    doc.y = top + IMAGE_HEIGHT + TEXT_HEIGHT + 6;
  }
}
