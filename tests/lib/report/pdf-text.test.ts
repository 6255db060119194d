import { describe, expect, it } from 'vitest';
import { pdfText } from '../../../lib/report/pdf-text';

describe('text for the PDF', () => {
  it('keeps Latin-1 and WinAnsi marks, spells out what Helvetica cannot show', () => {
    expect(pdfText('20 °C, 3 × 2 m, ch. 1\u20132 m, maker\u2019s data')).toBe(
      '20 °C, 3 × 2 m, ch. 1\u20132 m, maker\u2019s data',
    );
    expect(pdfText('PE80 σ = 6.3 MPa; f ≈ 0.02; x ≤ 1; −3 → 4')).toBe(
      'PE80 sigma = 6.3 MPa; f ~ 0.02; x <= 1; -3 -> 4',
    );
    expect(pdfText('日')).toBe('?');
  });
});
