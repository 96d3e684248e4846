// Sheet furniture for the framing plan: paper sizes, the border, the title block and the footer caution.
import type { jsPDF } from 'jspdf';
import type { UnitSystem } from '@/lib/units';
import { pdfText } from './text';

export type Paper = 'a4' | 'a3';

export interface PlanMeta {
  firm: string;
  job: string;
  client: string;
  site: string;
  designer: string;
  /** Already formatted for display, e.g. "1 Dec 2026". */
  date: string;
  revision: string;
  units: UnitSystem;
}

export interface SheetGeometry {
  paper: Paper;
  /** Landscape page size in mm. */
  w: number;
  h: number;
  margin: number;
  /** Width of the right-hand column (legend, notes, title block). */
  colW: number;
  titleH: number;
  /** Base font size in pt for tables and notes. */
  font: number;
}

/** Landscape sheet geometry for A4 and A3 (ISO 216 sizes). */
export function sheetGeometry(paper: Paper): SheetGeometry {
  return paper === 'a3'
    ? { paper, w: 420, h: 297, margin: 10, colW: 104, titleH: 66, font: 7.5 }
    : { paper, w: 297, h: 210, margin: 10, colW: 84, titleH: 60, font: 6.5 };
}

export const PT_MM = 25.4 / 72;

/** Draws the sheet border and the short footer caution. */
export function drawBorder(doc: jsPDF, g: SheetGeometry): void {
  doc.setDrawColor(0);
  doc.setLineWidth(0.5);
  doc.setLineDashPattern([], 0);
  doc.rect(g.margin, g.margin, g.w - 2 * g.margin, g.h - 2 * g.margin);
  doc.setFont('helvetica', 'normal');
  doc.setFontSize(5.5);
  doc.setTextColor(60);
  doc.text(
    pdfText(
      'Guidance only: local building codes and a qualified engineer decide. Guards on raised decks. Check for buried services before digging.',
    ),
    g.margin,
    g.h - g.margin + 4,
  );
  doc.setTextColor(0);
}

export interface TitleInfo {
  meta: PlanMeta;
  sheetTitle: string;
  scale: string;
  sheet: number;
  sheets: number;
}

/** Draws the title block in the bottom-right corner of the sheet. */
export function drawTitleBlock(doc: jsPDF, g: SheetGeometry, t: TitleInfo): void {
  const x0 = g.w - g.margin - g.colW;
  const y0 = g.h - g.margin - g.titleH;
  const w = g.colW;
  const h = g.titleH;
  doc.setDrawColor(0);
  doc.setLineDashPattern([], 0);
  doc.setLineWidth(0.5);
  doc.setFillColor(255, 255, 255);
  doc.rect(x0, y0, w, h, 'FD');
  doc.setLineWidth(0.2);

  // Head: firm and drawing title.
  const headH = 12;
  doc.setFillColor(235, 235, 235);
  doc.rect(x0, y0, w, headH, 'FD');
  doc.setFont('helvetica', 'bold');
  doc.setFontSize(10);
  doc.text(fit(doc, pdfText(t.meta.firm), w - 4), x0 + 2, y0 + 5);
  doc.setFontSize(8);
  doc.text(fit(doc, pdfText(`Framing plan - ${t.sheetTitle}`), w - 4), x0 + 2, y0 + 10);

  const unitsWord = t.meta.units === 'metric' ? 'Millimetres (mm)' : 'Feet and inches';
  const rowsSpec: [string, string][][] = [
    [
      ['Job', t.meta.job],
      ['Client', t.meta.client],
    ],
    [['Site', t.meta.site]],
    [
      ['Designer', t.meta.designer],
      ['Date', t.meta.date],
    ],
    [
      ['Revision', t.meta.revision],
      ['Scale', t.scale],
    ],
    [
      ['Units', unitsWord],
      ['Sheet', `${t.sheet} of ${t.sheets}`],
    ],
  ];
  const rowH = (h - headH) / rowsSpec.length;
  rowsSpec.forEach((cells, r) => {
    const y = y0 + headH + r * rowH;
    doc.line(x0, y, x0 + w, y);
    const cw = w / cells.length;
    cells.forEach(([label, value], c) => {
      const x = x0 + c * cw;
      if (c > 0) doc.line(x, y, x, y + rowH);
      doc.setFont('helvetica', 'normal');
      doc.setFontSize(5.5);
      doc.setTextColor(90);
      doc.text(label.toUpperCase(), x + 1.5, y + 2.6);
      doc.setTextColor(0);
      doc.setFont('helvetica', 'bold');
      doc.setFontSize(8);
      doc.text(fit(doc, pdfText(value || '-'), cw - 3), x + 1.5, y + rowH - 2);
    });
  });
  doc.setFont('helvetica', 'normal');
}

/** Shortens text with "..." until it fits maxW mm at the current font. */
export function fit(doc: jsPDF, text: string, maxW: number): string {
  if (doc.getTextWidth(text) <= maxW) return text;
  let s = text;
  while (s.length > 1 && doc.getTextWidth(`${s}...`) > maxW) s = s.slice(0, -1);
  return `${s}...`;
}
