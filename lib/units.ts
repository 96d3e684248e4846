// Display units: the engine works in millimetres; screens, PDFs and inputs convert only here.
import { unit } from 'mathjs';

export type UnitSystem = 'metric' | 'imperial';

const MM_PER_INCH = 25.4;

/** Formats a length for display: "4 800 mm" / "4.80 m" in metric, 15' 9" in imperial (to 1/8 in). */
export function formatLength(
  mm: number,
  system: UnitSystem,
  opts: { metricAs?: 'mm' | 'm' } = {},
): string {
  if (!Number.isFinite(mm)) return '—';
  if (system === 'metric') {
    if (opts.metricAs === 'm') return `${(mm / 1000).toFixed(2)} m`;
    return `${Math.round(mm).toLocaleString('en-GB').replace(/,/g, '\u2009')} mm`;
  }
  const sign = mm < 0 ? '-' : '';
  const eighths = Math.round((Math.abs(mm) / MM_PER_INCH) * 8);
  const feet = Math.floor(eighths / 96);
  const restEighths = eighths - feet * 96;
  const inches = Math.floor(restEighths / 8);
  let frac = restEighths - inches * 8;
  let den = 8;
  while (frac > 0 && frac % 2 === 0) {
    frac /= 2;
    den /= 2;
  }
  const inchText = frac ? `${inches} ${frac}/${den}"` : `${inches}"`;
  return feet ? `${sign}${feet}' ${inchText}` : `${sign}${inchText}`;
}

/** Formats an area given in m² for display. */
export function formatArea(m2: number, system: UnitSystem): string {
  if (system === 'metric') return `${m2.toFixed(2)} m²`;
  return `${unit(m2, 'm^2').toNumber('ft^2').toFixed(1)} ft²`;
}

/**
 * Parses a typed length into millimetres. Accepts "4800", "4800mm", "4.8m", "480cm",
 * "15'", "15' 9\"", "15ft 9 1/2in", "9.5in", "189\"". A bare number is mm in metric and inches in imperial.
 * Returns null when the text is not a length.
 */
export function parseLength(text: string, system: UnitSystem): number | null {
  const s = text.trim().toLowerCase().replace(/\s+/g, ' ');
  if (!s) return null;
  const num = String.raw`(\d+(?:\.\d+)?)`;
  const frac = String.raw`(?:\s*(\d+)\/(\d+))?`;
  const metric = new RegExp(String.raw`^${num}\s*(mm|cm|m)?$`).exec(s);
  if (metric && (metric[2] || system === 'metric')) {
    const v = Number(metric[1]);
    const factor = metric[2] === 'm' ? 1000 : metric[2] === 'cm' ? 10 : 1;
    return v * factor;
  }
  const imperial = new RegExp(
    String.raw`^(?:${num}\s*(?:'|ft|feet|foot))?\s*(?:${num}${frac}\s*(?:"|in|inch|inches)?)?$`,
  ).exec(s);
  if (imperial && (imperial[1] || imperial[2])) {
    const hasUnit = /'|ft|feet|foot|"|in/.test(s);
    if (!hasUnit && system === 'metric') return null;
    const feet = imperial[1] ? Number(imperial[1]) : 0;
    let inches = imperial[2] ? Number(imperial[2]) : 0;
    if (imperial[3] && imperial[4]) {
      const den = Number(imperial[4]);
      if (den === 0) return null;
      inches += Number(imperial[3]) / den;
    }
    return (feet * 12 + inches) * MM_PER_INCH;
  }
  return null;
}
