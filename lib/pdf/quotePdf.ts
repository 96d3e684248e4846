// The client's quote as a PDF (jspdf): the firm's details, a plan thumbnail of the deck outline,
// the priced lines, totals with tax and deposit, the terms and the standing cautions.
import { jsPDF } from 'jspdf';
import { formatMoney } from '@/lib/quote/totals';
import type { QuoteLine } from '@/lib/validation/quote';
import type { QuoteTotals } from '@/lib/quote/totals';
import { pdfText } from './text';

export interface QuotePdfInput {
  firm: { name: string; address: string; phone: string; email: string };
  client: { name: string; address: string };
  quote: {
    reference: string;
    title: string;
    revision: number;
    currency: string;
    validUntil: string;
    sentAt: string | null;
    lines: QuoteLine[];
    totals: QuoteTotals;
    terms: string;
  };
  /** Deck outline in mm, or null when the quote has no design. */
  outline: [number, number][] | null;
  cautions: string[];
}

const PAGE_W = 210;
const PAGE_H = 297;
const M = 15;

/** Draws the outline scaled into the box, keeping its proportions. */
function drawThumbnail(
  doc: jsPDF,
  outline: [number, number][],
  x: number,
  y: number,
  w: number,
  h: number,
) {
  const xs = outline.map((p) => p[0]);
  const ys = outline.map((p) => p[1]);
  const minX = Math.min(...xs);
  const maxX = Math.max(...xs);
  const minY = Math.min(...ys);
  const maxY = Math.max(...ys);
  const s = Math.min((w - 6) / Math.max(1, maxX - minX), (h - 10) / Math.max(1, maxY - minY));
  const ox = x + (w - (maxX - minX) * s) / 2;
  const oy = y + 3 + (h - 10 - (maxY - minY) * s) / 2;
  // Plan y grows upwards; the page's grows downwards.
  const pt = (p: [number, number]): [number, number] => [
    ox + (p[0] - minX) * s,
    oy + (maxY - p[1]) * s,
  ];
  doc.setDrawColor(200);
  doc.setLineWidth(0.2);
  doc.rect(x, y, w, h);
  doc.setDrawColor(40);
  doc.setFillColor(235, 228, 214);
  doc.setLineWidth(0.4);
  const pts = outline.map(pt);
  const segs = pts.slice(1).map((p, i) => [p[0] - pts[i][0], p[1] - pts[i][1]]);
  doc.lines(segs, pts[0][0], pts[0][1], [1, 1], 'FD', true);
  doc.setFontSize(7);
  doc.setTextColor(90);
  const wM = ((maxX - minX) / 1000).toFixed(2);
  const hM = ((maxY - minY) / 1000).toFixed(2);
  doc.text(pdfText(`Deck outline, about ${wM} m x ${hM} m`), x + w / 2, y + h - 2, {
    align: 'center',
  });
  doc.setTextColor(0);
}

/** Builds the quote PDF and returns its bytes. */
export async function quotePdf(input: QuotePdfInput): Promise<Uint8Array> {
  const doc = new jsPDF({ unit: 'mm', format: 'a4', orientation: 'portrait' });
  const money = (m: number) => pdfText(formatMoney(m, input.quote.currency));
  const { quote, totals } = { quote: input.quote, totals: input.quote.totals };
  doc.setProperties({ title: pdfText(`Quote ${quote.reference}`), creator: 'Joistwright' });

  // Firm block
  doc.setFont('helvetica', 'bold');
  doc.setFontSize(16);
  doc.text(pdfText(input.firm.name), M, M + 5);
  doc.setFont('helvetica', 'normal');
  doc.setFontSize(9);
  const firmLines = [
    input.firm.address,
    [input.firm.phone, input.firm.email].filter(Boolean).join('  ·  '),
  ]
    .filter(Boolean)
    .map(pdfText);
  doc.text(firmLines, M, M + 11);

  // Title
  let y = M + 26;
  doc.setFont('helvetica', 'bold');
  doc.setFontSize(13);
  doc.text(pdfText(`Quote ${quote.reference}`), M, y);
  doc.setFont('helvetica', 'normal');
  doc.setFontSize(9);
  y += 6;
  const issued = (quote.sentAt ?? new Date().toISOString()).slice(0, 10);
  const meta = [
    pdfText(quote.title),
    pdfText(`For: ${input.client.name || '-'}`),
    pdfText(`Site: ${input.client.address || '-'}`),
    pdfText(`Issued: ${issued}   Valid until: ${quote.validUntil}   Revision ${quote.revision}`),
  ];
  doc.text(meta, M, y, { maxWidth: 110 });
  if (input.outline && input.outline.length >= 3)
    drawThumbnail(doc, input.outline, 130, M + 20, 65, 48);

  // Lines
  y = M + 76;
  const cols = { desc: M, qty: 120, unit: 136, unitPrice: 165, amount: PAGE_W - M };
  const header = () => {
    doc.setFont('helvetica', 'bold');
    doc.setFontSize(8.5);
    doc.text('Item', cols.desc, y);
    doc.text('Qty', cols.qty, y, { align: 'right' });
    doc.text('Unit', cols.unit, y);
    doc.text('Unit price', cols.unitPrice, y, { align: 'right' });
    doc.text('Amount', cols.amount, y, { align: 'right' });
    doc.setLineWidth(0.2);
    doc.setDrawColor(120);
    doc.line(M, y + 1.5, PAGE_W - M, y + 1.5);
    doc.setFont('helvetica', 'normal');
    y += 6;
  };
  header();
  const byId = new Map(totals.lines.map((l) => [l.id, l]));
  for (const line of quote.lines) {
    const t = byId.get(line.id);
    const desc = doc.splitTextToSize(
      pdfText(line.description),
      cols.qty - cols.desc - 14,
    ) as string[];
    const h = desc.length * 4;
    if (y + h > PAGE_H - 40) {
      doc.addPage();
      y = M + 5;
      header();
    }
    doc.text(desc, cols.desc, y);
    doc.text(pdfText(String(Math.round(line.qty * 100) / 100)), cols.qty, y, { align: 'right' });
    doc.text(pdfText(line.unit), cols.unit, y);
    doc.text(money(t?.unitPrice ?? 0), cols.unitPrice, y, { align: 'right' });
    doc.text(money(t?.price ?? 0), cols.amount, y, { align: 'right' });
    y += h + 1.5;
  }

  // Totals
  if (y > PAGE_H - 80) {
    doc.addPage();
    y = M + 5;
  }
  doc.line(110, y, PAGE_W - M, y);
  y += 5;
  const row = (label: string, value: string, bold = false) => {
    doc.setFont('helvetica', bold ? 'bold' : 'normal');
    doc.text(pdfText(label), 150, y, { align: 'right' });
    doc.text(value, PAGE_W - M, y, { align: 'right' });
    y += 5;
  };
  row('Subtotal', money(totals.subtotal));
  if (totals.taxRatePercent > 0)
    row(`${totals.taxLabel} at ${totals.taxRatePercent} %`, money(totals.tax));
  row('Total', money(totals.total), true);
  if (totals.deposit > 0)
    row(`Deposit to book (${totals.depositPercent} %)`, money(totals.deposit), true);
  doc.setFont('helvetica', 'normal');

  // Terms and cautions
  y += 4;
  doc.setFont('helvetica', 'bold');
  doc.text('Terms', M, y);
  doc.setFont('helvetica', 'normal');
  y += 4.5;
  const terms = doc.splitTextToSize(pdfText(quote.terms || '-'), PAGE_W - 2 * M) as string[];
  for (const t of terms) {
    if (y > PAGE_H - 30) {
      doc.addPage();
      y = M + 5;
    }
    doc.text(t, M, y);
    y += 4;
  }
  y += 3;
  if (y > PAGE_H - 30) {
    doc.addPage();
    y = M + 5;
  }
  doc.setFont('helvetica', 'bold');
  doc.text('Please note', M, y);
  doc.setFont('helvetica', 'normal');
  y += 4.5;
  for (const c of input.cautions) {
    const ls = doc.splitTextToSize(pdfText(`- ${c}`), PAGE_W - 2 * M) as string[];
    doc.text(ls, M, y);
    y += ls.length * 4;
  }
  const pages = doc.getNumberOfPages();
  for (let i = 1; i <= pages; i += 1) {
    doc.setPage(i);
    doc.setFontSize(7);
    doc.setTextColor(110);
    doc.text(
      pdfText(`${input.firm.name} · Quote ${quote.reference} · page ${i} of ${pages}`),
      M,
      PAGE_H - 8,
    );
    doc.setTextColor(0);
  }
  return new Uint8Array(doc.output('arraybuffer'));
}
