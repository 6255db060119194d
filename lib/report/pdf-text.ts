/**
 * The PDF uses pdfkit's built-in Helvetica (WinAnsi encoding): Latin-1 plus a few marks such as
 * the en dash, curly quotes and ×. Catalogue and message text sometimes carries Greek letters and
 * maths signs outside it (σ, ≈, −, →); they are written out so no glyph prints as garbage.
 */
const SPELLED: Record<string, string> = {
  σ: 'sigma',
  ε: 'epsilon',
  ν: 'nu',
  ρ: 'rho',
  Δ: 'delta',
  '≈': '~',
  '≤': '<=',
  '≥': '>=',
  '−': '-',
  '→': '->',
  '√': 'sqrt',
  '₁': '1',
  '₂': '2',
  '∞': 'infinity',
};

/** Characters WinAnsi (code page 1252) can show beyond Latin-1. */
const WIN_ANSI_EXTRA = new Set('€‚ƒ„…†‡ˆ‰Š‹ŒŽ‘’“”•–—˜™š›œžŸ'.split(''));

export function pdfText(text: string): string {
  let out = '';
  for (const ch of text) {
    const code = ch.codePointAt(0)!;
    if (code < 0x80 || (code >= 0xa0 && code <= 0xff) || WIN_ANSI_EXTRA.has(ch) || ch === '\n') out += ch;
    else out += SPELLED[ch] ?? '?';
  }
  return out;
}
