import { describe, expect, it } from 'vitest';
import { analyzeLine, FOOT_M, US_GALLON_M3 } from '../../../hydraulics/index';
import { localiseWarningText } from '../../../lib/lines/localise-text';
import { pdfText } from '../../../lib/report/pdf-text';
import { displayUnits } from '../../../lib/units/index';
import { referenceLine } from '../../lines/reference-line';

const us = displayUnits('us');
const metric = displayUnits('metric');

describe('warning words in the project units', () => {
  it('leaves metric text as the core wrote it', () => {
    const text = 'static pressure from ch. 537.3\u20131400.0 m rises above the 81.6 m allowed';
    expect(localiseWarningText(text, metric)).toBe(text);
  });

  it('restates chainages, heads, speeds and flows in feet and gallons per minute, and leaves pipe sizes alone', () => {
    // 1 ft = 0.3048 m exactly (international foot); 1 US gal = 3.785411784 L: the core's own constants.
    expect(FOOT_M).toBe(0.3048);
    const text = 'From ch. 530.4\u2013747.2 m the 40 mm PE80 pipe sees 81.7 m at ch. 650.0 m; 1.23 m/s at 1.20 L/s, down to -2.7 m.';
    const out = localiseWarningText(text, us);
    expect(out).toBe(`From ch. 1740\u20132451 ft the 40 mm PE80 pipe sees 268.0 ft at ch. 2133 ft; 4.04 ft/s at ${(0.0012 / (US_GALLON_M3 / 60)).toFixed(1)} US gpm, down to -8.9 ft.`);
  });

  it('leaves no metre figure in any message of the reference line for a US project', () => {
    for (const w of analyzeLine(referenceLine()).warnings) {
      const out = `${localiseWarningText(w.message, us)} ${localiseWarningText(w.suggestedFix, us)}`;
      expect(out).not.toMatch(/\d m\b(?!m)/);
      expect(out).not.toMatch(/m\/s|L\/s/);
    }
  });
});

describe('text for the PDF', () => {
  it('keeps Latin-1 and WinAnsi marks, spells out what Helvetica cannot show', () => {
    expect(pdfText('20 °C, 3 × 2 m, ch. 1\u20132 m, maker\u2019s data')).toBe('20 °C, 3 × 2 m, ch. 1\u20132 m, maker\u2019s data');
    expect(pdfText('PE80 σ = 6.3 MPa; f ≈ 0.02; x ≤ 1; −3 → 4')).toBe('PE80 sigma = 6.3 MPa; f ~ 0.02; x <= 1; -3 -> 4');
    expect(pdfText('日')).toBe('?');
  });
});
