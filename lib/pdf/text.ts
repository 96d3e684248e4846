// Text for the PDF: jspdf's built-in Helvetica speaks WinAnsi only, so everything passes through here.
import { formatLength, type UnitSystem } from '@/lib/units';

// Characters Helvetica's WinAnsi encoding has beyond plain ASCII, which we keep as they are.
const WIN_ANSI_EXTRA = new Set(
  '€‚ƒ„…†‡ˆ‰Š‹ŒŽ‘’“”•–—˜™š›œžŸ ¡¢£¤¥¦§¨©ª«¬®¯°±²³´µ¶·¸¹º»¼½¾¿ÀÁÂÃÄÅÆÇÈÉÊËÌÍÎÏÐÑÒÓÔÕÖ×ØÙÚÛÜÝÞßàáâãäåæçèéêëìíîïðñòóôõö÷øùúûüýþÿ'.split(
    '',
  ),
);

const REPLACEMENTS: Record<string, string> = {
  '\u2009': ' ', // thin space (lib/units groups thousands with it)
  '\u202f': ' ',
  '\u2002': ' ',
  '\u2003': ' ',
  '\u2212': '-', // minus sign
  '\u2264': '<=',
  '\u2265': '>=',
  '\u2248': '~',
  '\u2192': '->',
  '\u2190': '<-',
  '\u2026': '...',
  '\u00d7': '×',
};

/**
 * Makes a string safe for jspdf's standard fonts: known look-alikes are swapped for WinAnsi
 * characters, anything else outside WinAnsi becomes "?".
 * WARNING: one character outside the font's encoding makes jspdf re-encode the whole string and the
 * text comes out letter-spaced and unsearchable, so never skip this.
 */
export function pdfText(s: string): string {
  let out = '';
  for (const ch of s) {
    const code = ch.codePointAt(0) ?? 0;
    if (REPLACEMENTS[ch] !== undefined) out += REPLACEMENTS[ch];
    else if ((code >= 0x20 && code < 0x7f) || ch === '\n') out += ch;
    else if (WIN_ANSI_EXTRA.has(ch)) out += ch;
    else if (ch === '\t') out += ' ';
    else out += '?';
  }
  return out;
}

/** A length for the PDF, in the reader's units: "4 800 mm" or 15' 9". */
export function len(mm: number, units: UnitSystem): string {
  return pdfText(formatLength(mm, units));
}

/** A bare length for dimension lines, without the unit in metric ("4 800"); feet-inches as usual. */
export function dimText(mm: number, units: UnitSystem): string {
  const s = pdfText(formatLength(mm, units));
  return units === 'metric' ? s.replace(/ mm$/, '') : s;
}
