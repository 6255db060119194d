import { describe, expect, it } from 'vitest';
import { analyzeLine, FOOT_M, US_GALLON_M3 } from '../../../hydraulics/index';
import { localiseWarningText } from '../../../lib/units/localise-text';
import { pdfText } from '../../../lib/report/pdf-text';
import { referenceLine } from '../../lines/reference-line';

const us = 'us' as const;
const metric = 'metric' as const;

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

describe('storage, ram and survey messages in the project units', () => {
  it('restates cubic metres as US gallons and L/min as US gpm, before any metre rule can take them', () => {
    // 1 US gal = 3.785411784 L exactly (NIST Handbook 44, App. C, from memory): 3.20 m³ = 845.4 US gal.
    const out = localiseWarningText('The tank holds less than the daily cycle plus the reserve (3.20 m³); the ram gives 2.5 L/min.', us);
    expect(out).toBe(`The tank holds less than the daily cycle plus the reserve (845 US gal); the ram gives ${(2.5 / 3.785411784).toFixed(2)} US gpm.`);
    expect(out).not.toMatch(/m³|L\/min/);
  });

  it('leaves metric storage text alone', () => {
    const text = 'the tank is 1.4 m too low (3.20 m³)';
    expect(localiseWarningText(text, metric)).toBe(text);
  });
});
