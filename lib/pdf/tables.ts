// Flows the plan's tables and notes into columns across schedule sheets, repeating headers on breaks.
import type { jsPDF } from 'jspdf';
import type { SheetGeometry } from './sheet';
import type { Table } from './schedules';
import { PT_MM } from './sheet';
import { pdfText } from './text';

export type Block =
  { kind: 'table'; table: Table } | { kind: 'notes'; title: string; items: string[] };

export interface FlowHooks {
  /** Adds a schedule sheet and returns nothing; the flow draws on the current page. */
  newSheet: () => void;
}

interface Cursor {
  col: number;
  y: number;
}

/** Draws blocks in columns; calls hooks.newSheet() whenever a sheet fills up (and once to start). */
export function flowBlocks(doc: jsPDF, g: SheetGeometry, blocks: Block[], hooks: FlowHooks): void {
  const cols = g.paper === 'a3' ? 3 : 2;
  const gap = 6;
  const left = g.margin + 4;
  const right = g.w - g.margin - 4;
  const top = g.margin + 5;
  const colW = (right - left - gap * (cols - 1)) / cols;
  const colX = (c: number) => left + c * (colW + gap);
  // The last column stops above the title block.
  const bottom = (c: number) =>
    c === cols - 1 ? g.h - g.margin - g.titleH - 4 : g.h - g.margin - 4;
  const lineH = g.font * PT_MM * 1.25;
  const cur: Cursor = { col: 0, y: top };
  hooks.newSheet();

  const advance = () => {
    cur.col += 1;
    cur.y = top;
    if (cur.col >= cols) {
      hooks.newSheet();
      cur.col = 0;
    }
  };
  const heading = (title: string) => {
    doc.setFont('helvetica', 'bold');
    doc.setFontSize(g.font + 2);
    doc.setTextColor(0);
    doc.text(pdfText(title), colX(cur.col), cur.y + 3.2);
    cur.y += 5.5;
  };

  for (const block of blocks) {
    if (block.kind === 'notes') {
      if (cur.y + 5.5 + lineH * 2 > bottom(cur.col)) advance();
      heading(block.title);
      doc.setFont('helvetica', 'normal');
      doc.setFontSize(g.font);
      block.items.forEach((item, i) => {
        const label = `${i + 1}.`;
        const lines: string[] = doc.splitTextToSize(pdfText(item), colW - 5);
        const h = lines.length * lineH + 1;
        if (cur.y + h > bottom(cur.col)) {
          advance();
          heading(`${block.title} (continued)`);
          doc.setFont('helvetica', 'normal');
          doc.setFontSize(g.font);
        }
        doc.text(label, colX(cur.col), cur.y + lineH * 0.8);
        lines.forEach((l, k) => doc.text(l, colX(cur.col) + 5, cur.y + lineH * (0.8 + k)));
        cur.y += h;
      });
      cur.y += 4;
      continue;
    }
    const t = block.table;
    const totalW = t.columns.reduce((s, c) => s + c.width, 0);
    const widths = t.columns.map((c) => (c.width / totalW) * colW);
    const pad = 0.8;
    doc.setFontSize(g.font);
    const rowLines = (cells: string[]) =>
      cells.map((c, i) => doc.splitTextToSize(pdfText(c), widths[i] - 2 * pad) as string[]);
    const rowH = (lines: string[][]) => Math.max(1, ...lines.map((l) => l.length)) * lineH + 1.2;
    const drawRow = (cells: string[], header: boolean, shade: boolean) => {
      doc.setFont('helvetica', header ? 'bold' : 'normal');
      doc.setFontSize(g.font);
      const lines = rowLines(cells);
      const h = rowH(lines);
      let x = colX(cur.col);
      if (header || shade) {
        doc.setFillColor(header ? 225 : 245, header ? 225 : 245, header ? 225 : 245);
        doc.rect(x, cur.y, colW, h, 'F');
      }
      lines.forEach((ls, i) => {
        const align = t.columns[i].align ?? 'left';
        ls.forEach((l, k) => {
          const ty = cur.y + lineH * (0.85 + k) + 0.3;
          if (align === 'right') doc.text(l, x + widths[i] - pad - doc.getTextWidth(l), ty);
          else doc.text(l, x + pad, ty);
        });
        x += widths[i];
      });
      doc.setDrawColor(180);
      doc.setLineWidth(0.1);
      doc.line(colX(cur.col), cur.y + h, colX(cur.col) + colW, cur.y + h);
      cur.y += h;
    };
    const headerCells = t.columns.map((c) => c.label);
    const headerH = rowH(rowLines(headerCells));
    const firstH = t.rows.length ? rowH(rowLines(t.rows[0])) : 0;
    if (cur.y + 5.5 + headerH + firstH > bottom(cur.col)) advance();
    heading(t.title);
    drawRow(headerCells, true, false);
    t.rows.forEach((r, i) => {
      doc.setFontSize(g.font);
      const h = rowH(rowLines(r));
      if (cur.y + h > bottom(cur.col)) {
        advance();
        heading(`${t.title} (continued)`);
        drawRow(headerCells, true, false);
      }
      drawRow(r, false, i % 2 === 1);
    });
    if (t.notes?.length) {
      doc.setFont('helvetica', 'italic');
      doc.setFontSize(g.font - 0.5);
      for (const n of t.notes) {
        const lines: string[] = doc.splitTextToSize(pdfText(n), colW);
        const h = lines.length * lineH * 0.95;
        if (cur.y + h + 1 > bottom(cur.col)) advance();
        lines.forEach((l, k) => doc.text(l, colX(cur.col), cur.y + 1 + lineH * (0.8 + k * 0.95)));
        cur.y += h + 0.8;
      }
      doc.setFont('helvetica', 'normal');
    }
    cur.y += 5;
  }
}
