// The crew's framing plan as a PDF: plan to scale with dimensions, legend, title block and schedules.
import { jsPDF } from 'jspdf';
import type { DesignDocument } from '@/engine/schema';
import type { FramePlan } from '@/engine/types';
import type { UnitSystem } from '@/lib/units';
import {
  type Box,
  type Chain,
  type DrawStyle,
  type FrameAxes,
  type V2,
  type View,
  CHAIN_FIRST,
  CHAIN_GAP,
  drawFlagMarker,
  drawJoistLine,
  drawNogginLine,
  drawPad,
  drawPlan,
  drawPost,
  drawSupportBand,
  frameAxes,
  geometryPoints,
  paperExtent,
  planChains,
  planBoundsWithin,
  polygon,
} from './planDrawing';
import {
  CAUTIONS,
  cutListTable,
  flagsTable,
  footingSchedule,
  memberSchedule,
  planNotes,
  quantitiesTable,
} from './schedules';
import {
  type Paper,
  type PlanMeta,
  type SheetGeometry,
  PT_MM,
  drawBorder,
  drawTitleBlock,
  fit,
  sheetGeometry,
} from './sheet';
import { type Block, flowBlocks } from './tables';
import { pdfText } from './text';

export type { Paper, PlanMeta } from './sheet';

export interface FramingPlanInput {
  plan: FramePlan;
  design: DesignDocument;
  meta: PlanMeta;
  paper: Paper;
}

/** Standard drawing scales tried, largest first (1:20 ... 1:2000). */
export const STANDARD_SCALES = [20, 25, 50, 100, 200, 250, 500, 1000, 2000] as const;
/** The smallest scale at which joist centres stay legible; beyond it the plan is split into parts. */
export const DETAIL_SCALE = 100;

interface SheetRecord {
  title: string;
  scale: string;
}

/** Chooses the largest standard scale at which the plan and its dimensions fit the area, or null. */
export function chooseScale(
  points: V2[],
  chains: Chain[],
  area: { w: number; h: number },
  scales: readonly number[] = STANDARD_SCALES,
): number | null {
  for (const s of scales) {
    const e = paperExtent(points, chains, s);
    if (e.x1 - e.x0 <= area.w && e.y1 - e.y0 <= area.h) return s;
  }
  return null;
}

function planArea(g: SheetGeometry): Box {
  return {
    x0: g.margin + 3,
    y0: g.margin + 10,
    x1: g.w - g.margin - g.colW - 3,
    y1: g.h - g.margin - 3,
  };
}

function centredView(points: V2[], chains: Chain[], scale: number, area: Box): View {
  const e = paperExtent(points, chains, scale);
  const xs = points.map((q) => q[0]);
  const ys = points.map((q) => q[1]);
  return {
    scale,
    cx: area.x0 + (area.x1 - area.x0 - (e.x1 - e.x0)) / 2 - e.x0,
    cy: area.y0 + (area.y1 - area.y0 - (e.y1 - e.y0)) / 2 - e.y0,
    window: { x0: Math.min(...xs), y0: Math.min(...ys), x1: Math.max(...xs), y1: Math.max(...ys) },
    part: false,
  };
}

/** Paper margins each side of a part sheet's window, from the chains that sit on that side. */
function partMargins(chains: Chain[]) {
  const count = { left: 0, right: 0, top: 0, bottom: 0 };
  for (const c of chains) {
    if (c.kind === 'overall') continue;
    if (c.normal[0] > 0.01) count.right += 1;
    if (c.normal[0] < -0.01) count.left += 1;
    if (c.normal[1] > 0.01) count.top += 1;
    if (c.normal[1] < -0.01) count.bottom += 1;
  }
  const m = (n: number) => (n ? CHAIN_FIRST + (n - 1) * CHAIN_GAP + 6 : 4);
  return {
    left: m(count.left) + 4,
    right: m(count.right) + 4,
    top: m(count.top),
    bottom: m(count.bottom),
  };
}

interface Part {
  label: string;
  /** What the part shows: the plan's extent inside its tile. */
  window: Box;
  /** The tile of the grid the part belongs to. */
  tile: Box;
}

function splitIntoParts(plan: FramePlan, points: V2[], chains: Chain[], area: Box, scale: number) {
  const m = partMargins(chains);
  const capW = (area.x1 - area.x0 - m.left - m.right) * scale;
  const capH = (area.y1 - area.y0 - m.top - m.bottom) * scale;
  const xs = points.map((q) => q[0]);
  const ys = points.map((q) => q[1]);
  const gx0 = Math.min(...xs);
  const gy0 = Math.min(...ys);
  const W = Math.max(...xs) - gx0;
  const H = Math.max(...ys) - gy0;
  const nx = Math.max(1, Math.ceil(W / capW));
  const ny = Math.max(1, Math.ceil(H / capH));
  const parts: Part[] = [];
  for (let r = 0; r < ny; r++) {
    for (let c = 0; c < nx; c++) {
      // Row 1 is the top of the plan (largest y), as it reads on paper.
      const window: Box = {
        x0: gx0 + (W * c) / nx,
        x1: gx0 + (W * (c + 1)) / nx,
        y1: gy0 + H - (H * r) / ny,
        y0: gy0 + H - (H * (r + 1)) / ny,
      };
      // Each part shows only the stretch of plan inside its tile, where it sits on the tile.
      const drawn = planBoundsWithin(plan, window);
      if (!drawn) continue;
      parts.push({ label: `${String.fromCharCode(65 + c)}${r + 1}`, window: drawn, tile: window });
    }
  }
  const partW = W / nx / scale;
  const partH = H / ny / scale;
  const x0 = area.x0 + m.left + (area.x1 - area.x0 - m.left - m.right - partW) / 2;
  const y0 = area.y0 + m.top + (area.y1 - area.y0 - m.top - m.bottom - partH) / 2;
  return parts.map((p) => ({
    ...p,
    view: {
      scale,
      cx: x0 - p.tile.x0 / scale,
      cy: y0 + p.tile.y1 / scale,
      window: p.window,
      part: true,
    } satisfies View,
  }));
}

function scaleText(scale: number, paper: Paper) {
  return `1:${scale} at ${paper.toUpperCase()}`;
}

/** Legend: one sample of every line style and symbol the plan uses (our own symbols). */
function drawLegend(doc: jsPDF, g: SheetGeometry, x: number, y: number, w: number): number {
  doc.setFont('helvetica', 'bold');
  doc.setFontSize(g.font + 1.5);
  doc.setTextColor(0);
  doc.text('Legend', x, y + 3);
  const rowH = g.paper === 'a3' ? 5 : 4.4;
  const colW = w / 2;
  const sample = 9;
  type Item = [string, (sx: number, sy: number) => void];
  const items: Item[] = [
    ['Joist (single)', (sx, sy) => drawJoistLine(doc, [sx, sy], [sx + sample, sy], 1)],
    [
      'Paired joist (butt joint)',
      (sx, sy) => drawJoistLine(doc, [sx, sy], [sx + sample, sy], 2, 2),
    ],
    ['Triple joist (border)', (sx, sy) => drawJoistLine(doc, [sx, sy], [sx + sample, sy], 3, 3)],
    [
      'Rim',
      (sx, sy) => {
        doc.setDrawColor(0);
        doc.setLineWidth(0.55);
        doc.line(sx, sy, sx + sample, sy);
      },
    ],
    ['Noggin row', (sx, sy) => drawNogginLine(doc, [sx, sy], [sx + sample, sy])],
    [
      'Support row: blocks',
      (sx, sy) =>
        drawSupportBand(
          doc,
          [
            [sx, sy - 0.8],
            [sx + sample, sy - 0.8],
            [sx + sample, sy + 0.8],
            [sx, sy + 0.8],
          ],
          'blocks',
        ),
    ],
    ['Pad: block laid flat', (sx, sy) => drawPad(doc, [sx + sample / 2, sy], 4.4, 2.1, [1, 0])],
    ['Post in concrete', (sx, sy) => drawPost(doc, [sx + sample / 2, sy], 1.6)],
    [
      'Step, tread lines',
      (sx, sy) => {
        doc.setDrawColor(0);
        doc.setLineWidth(0.3);
        polygon(
          doc,
          [
            [sx, sy - 1.6],
            [sx + sample, sy - 1.6],
            [sx + sample, sy + 1.6],
            [sx, sy + 1.6],
          ],
          'S',
        );
        doc.setLineWidth(0.18);
        doc.line(sx, sy, sx + sample, sy);
      },
    ],
    [
      'Joist join (on support)',
      (sx, sy) => {
        drawJoistLine(doc, [sx, sy], [sx + sample, sy], 1);
        doc.setDrawColor(0);
        doc.setLineWidth(0.2);
        doc.setFillColor(255, 255, 255);
        doc.circle(sx + sample / 2, sy, 0.55, 'FD');
      },
    ],
    [
      'Check: error / warning',
      (sx, sy) => {
        drawFlagMarker(doc, [sx + 2, sy], 1, 'error');
        drawFlagMarker(doc, [sx + 6.8, sy], 2, 'warning');
      },
    ],
    [
      'Equal gaps, e.g. 12 gaps',
      (sx, sy) => {
        doc.setFont('helvetica', 'normal');
        doc.setFontSize(g.font - 0.5);
        doc.text('12 @ 400', sx - 1, sy + 0.9);
      },
    ],
  ];
  items.forEach(([label, draw], i) => {
    const cx = x + (i % 2) * colW;
    const cy = y + 7 + Math.floor(i / 2) * rowH;
    doc.setLineDashPattern([], 0);
    draw(cx, cy);
    doc.setFont('helvetica', 'normal');
    doc.setFontSize(g.font - 0.5);
    doc.setTextColor(0);
    doc.text(fit(doc, pdfText(label), colW - sample - 3), cx + sample + 1.5, cy + 0.9);
  });
  doc.setFontSize(g.font - 1);
  doc.setTextColor(60);
  const tail = 'x2 / x3 on the joist chain: two or three pieces side by side there.';
  const ty = y + 7 + Math.ceil(items.length / 2) * rowH;
  doc.text(fit(doc, tail, w), x, ty);
  doc.setTextColor(0);
  return ty + 2;
}

function niceBarLength(
  scale: number,
  units: UnitSystem,
  maxPaper: number,
): { mm: number; label: (k: number) => string } {
  if (units === 'imperial') {
    const ft = [1, 2, 5, 10, 20, 50, 100, 200];
    const pick = [...ft].reverse().find((f) => (f * 304.8) / scale <= maxPaper) ?? 1;
    return { mm: pick * 304.8, label: (k) => `${+(pick * k).toFixed(1)}'` };
  }
  const m = [0.5, 1, 2, 5, 10, 20, 50];
  const pick = [...m].reverse().find((v) => (v * 1000) / scale <= maxPaper) ?? 0.5;
  return { mm: pick * 1000, label: (k) => `${+(pick * k).toFixed(2)} m` };
}

/** Scale bar (four alternating segments) and the plan axes with the board and joist directions. */
function drawScaleAndAxes(
  doc: jsPDF,
  g: SheetGeometry,
  x: number,
  y: number,
  w: number,
  scale: number,
  units: UnitSystem,
  design: DesignDocument,
  axes: FrameAxes,
): number {
  doc.setFont('helvetica', 'bold');
  doc.setFontSize(g.font + 1.5);
  doc.text(`Scale 1:${scale}`, x, y + 3);
  const barW = w - 32;
  const bar = niceBarLength(scale, units, barW);
  const seg = bar.mm / scale / 4;
  const by = y + 6;
  doc.setLineDashPattern([], 0);
  doc.setLineWidth(0.2);
  doc.setDrawColor(0);
  for (let k = 0; k < 4; k++) {
    doc.setFillColor(k % 2 ? 255 : 0, k % 2 ? 255 : 0, k % 2 ? 255 : 0);
    doc.rect(x + k * seg, by, seg, 1.6, 'FD');
  }
  doc.setFont('helvetica', 'normal');
  doc.setFontSize(g.font - 0.5);
  doc.text('0', x - 0.6, by + 4.4);
  const half = bar.label(0.5);
  doc.text(half, x + 2 * seg - doc.getTextWidth(half) / 2, by + 4.4);
  const full = bar.label(1);
  doc.text(full, x + 4 * seg - doc.getTextWidth(full) / 2, by + 4.4);

  // Axes: x to the right, y up the sheet, and the board and joist directions.
  const ox = x + w - 22;
  const oy = y + 14;
  const arrow = (dx: number, dy: number, len: number, label: string, dashed: boolean) => {
    const ex = ox + dx * len;
    const ey = oy + dy * len;
    doc.setLineDashPattern(dashed ? [0.8, 0.5] : [], 0);
    doc.setLineWidth(0.3);
    doc.line(ox, oy, ex, ey);
    doc.setLineDashPattern([], 0);
    const hx = -dx * 1.6;
    const hy = -dy * 1.6;
    doc.setFillColor(0, 0, 0);
    doc.triangle(
      ex,
      ey,
      ex + hx - hy * 0.5,
      ey + hy + hx * 0.5,
      ex + hx + hy * 0.5,
      ey + hy - hx * 0.5,
      'F',
    );
    doc.text(label, ex + dx * 1.5 - (dx < -0.1 ? doc.getTextWidth(label) : 0), ey + dy * 1.5 + 1);
  };
  doc.setDrawColor(0);
  arrow(1, 0, 9, 'x', false);
  arrow(0, -1, 9, 'y', false);
  // Board and joist directions, drawn from their own origin below the axes.
  const a = (design.boardAngleDeg * Math.PI) / 180;
  const bx = x + 6;
  const byy = y + 17;
  doc.setFontSize(g.font - 0.5);
  doc.setLineWidth(0.25);
  doc.setDrawColor(150, 90, 20);
  const d: V2 = [Math.cos(a), -Math.sin(a)];
  doc.setLineDashPattern([0.8, 0.5], 0);
  doc.line(bx - d[0] * 5, byy - d[1] * 5, bx + d[0] * 5, byy + d[1] * 5);
  doc.setDrawColor(0);
  doc.setLineDashPattern([], 0);
  doc.setLineWidth(0.3);
  const jd: V2 = [axes.j[0], -axes.j[1]];
  doc.line(bx - jd[0] * 5, byy - jd[1] * 5, bx + jd[0] * 5, byy + jd[1] * 5);
  doc.text('boards (dashed)', bx + 7, byy - 0.5);
  doc.text('joists (solid)', bx + 7, byy + 2.5);
  doc.setFontSize(g.font - 1);
  doc.setTextColor(60);
  doc.text('Plan axes as drawn in the design; no north given.', x, y + 25);
  doc.setTextColor(0);
  return y + 26;
}

/** The cautions on every plan sheet; the font shrinks (to 5 pt) before any caution is dropped. */
function drawCautionBox(
  doc: jsPDF,
  g: SheetGeometry,
  x: number,
  y: number,
  w: number,
  bottom: number,
  plan: FramePlan,
) {
  doc.setFont('helvetica', 'bold');
  doc.setFontSize(g.font + 1.5);
  doc.text('Cautions', x, y + 3);
  doc.setFont('helvetica', 'normal');
  const errors = plan.flags.filter((f) => f.severity === 'error').length;
  const warnings = plan.flags.filter((f) => f.severity === 'warning').length;
  const items = [
    ...CAUTIONS,
    errors || warnings
      ? `This plan has ${errors} error${errors === 1 ? '' : 's'} and ${warnings} warning${warnings === 1 ? '' : 's'} (numbered markers; listed under "Checks to resolve"). Do not build until the errors are cleared.`
      : 'The checks found no errors or warnings.',
  ].map(pdfText);
  let size = g.font;
  let laid: string[][] = [];
  let lineH = 0;
  for (; size >= 5; size -= 0.5) {
    doc.setFontSize(size);
    lineH = size * PT_MM * 1.25;
    laid = items.map((item) => doc.splitTextToSize(item, w) as string[]);
    const h = laid.reduce((s, l) => s + l.length * lineH + 1.2, 0);
    if (y + 6 + h <= bottom) break;
  }
  let cy = y + 6;
  for (const lines of laid) {
    lines.forEach((l, k) => doc.text(l, x, cy + lineH * (0.8 + k)));
    cy += lines.length * lineH + 1.2;
  }
}

function drawKeyPlan(
  doc: jsPDF,
  g: SheetGeometry,
  plan: FramePlan,
  parts: Part[],
  current: string | null,
  box: Box,
) {
  const pts = geometryPoints(plan);
  const xs = pts.map((q) => q[0]);
  const ys = pts.map((q) => q[1]);
  const W = Math.max(...xs) - Math.min(...xs) || 1;
  const H = Math.max(...ys) - Math.min(...ys) || 1;
  const s = Math.max(W / (box.x1 - box.x0), H / (box.y1 - box.y0 - 5));
  const ox = box.x0 + (box.x1 - box.x0 - W / s) / 2;
  const oy = box.y0 + 5 + (box.y1 - box.y0 - 5 - H / s) / 2;
  const P = (q: V2): V2 => [ox + (q[0] - Math.min(...xs)) / s, oy + (Math.max(...ys) - q[1]) / s];
  doc.setFont('helvetica', 'bold');
  doc.setFontSize(g.font + 1.5);
  doc.text('Key plan', box.x0, box.y0 + 3);
  doc.setFillColor(246, 244, 238);
  doc.setDrawColor(80);
  doc.setLineWidth(0.2);
  polygon(doc, (plan.outline as V2[]).map(P), 'FD');
  doc.setFont('helvetica', 'normal');
  doc.setFontSize(g.font - 0.5);
  for (const p of parts) {
    const a = P([p.window.x0, p.window.y1]);
    const b = P([p.window.x1, p.window.y0]);
    if (p.label === current) {
      doc.setFillColor(255, 220, 150);
      doc.rect(a[0], a[1], b[0] - a[0], b[1] - a[1], 'F');
    }
    doc.setDrawColor(0);
    doc.setLineDashPattern([1, 0.6], 0);
    doc.rect(a[0], a[1], b[0] - a[0], b[1] - a[1], 'S');
    doc.setLineDashPattern([], 0);
    doc.text(p.label, (a[0] + b[0]) / 2 - doc.getTextWidth(p.label) / 2, (a[1] + b[1]) / 2 + 1);
  }
}

/** Builds the framing plan PDF: plan sheet(s) to scale, then schedule sheets; returns its bytes. */
export function framingPlanPdf(input: FramingPlanInput): Uint8Array {
  const { plan, design, meta, paper } = input;
  const g = sheetGeometry(paper);
  const units = meta.units;
  const doc = new jsPDF({ orientation: 'landscape', unit: 'mm', format: paper, compress: true });
  doc.setProperties({
    title: pdfText(`Framing plan - ${meta.job}`),
    subject: pdfText(`${meta.site} (${meta.client})`),
    author: pdfText(meta.firm),
    creator: 'Joistwright',
  });
  const sheets: SheetRecord[] = [];
  const style: DrawStyle = { dimFont: paper === 'a3' ? 6.5 : 5.8, labelFont: g.font };
  const axes = frameAxes(design);
  const chains = planChains(plan, design, axes);
  const points = geometryPoints(plan);
  const area = planArea(g);
  const fitScale = chooseScale(points, chains, { w: area.x1 - area.x0, h: area.y1 - area.y0 });
  const overviewScale = fitScale ?? STANDARD_SCALES[STANDARD_SCALES.length - 1];
  const needsParts = overviewScale > DETAIL_SCALE;
  const parts = needsParts ? splitIntoParts(plan, points, chains, area, DETAIL_SCALE) : [];
  const colX = g.w - g.margin - g.colW;
  const titleTop = g.h - g.margin - g.titleH;

  const planSheet = (title: string, view: View, overview: boolean, current: string | null) => {
    if (sheets.length) doc.addPage(paper, 'landscape');
    sheets.push({ title, scale: scaleText(view.scale, paper) });
    drawBorder(doc, g);
    doc.setDrawColor(0);
    doc.setLineWidth(0.3);
    doc.line(colX, g.margin, colX, g.h - g.margin);
    doc.setFont('helvetica', 'bold');
    doc.setFontSize(g.font + 3.5);
    doc.setTextColor(0);
    const heading = pdfText(`${title.toUpperCase()}  1:${view.scale}`);
    doc.text(heading, g.margin + 3, g.margin + 6);
    if (overview) {
      doc.setFont('helvetica', 'normal');
      doc.setFontSize(g.font);
      doc.text(
        pdfText(
          `Too large to dimension in full at this scale: joist centres and rows are dimensioned on the part sheets (1:${DETAIL_SCALE}).`,
        ),
        g.margin + 3 + doc.getTextWidth(heading) + 12,
        g.margin + 6,
      );
    }
    drawPlan(doc, { plan, design, units, view, axes, chains, style, overview });
    if (overview) {
      doc.setFont('helvetica', 'bold');
      doc.setFontSize(g.font + 1);
      doc.setLineWidth(0.3);
      for (const p of parts) {
        const a: V2 = [view.cx + p.window.x0 / view.scale, view.cy - p.window.y1 / view.scale];
        const b: V2 = [view.cx + p.window.x1 / view.scale, view.cy - p.window.y0 / view.scale];
        doc.setDrawColor(190, 100, 0);
        doc.setLineDashPattern([2.5, 1, 0.5, 1], 0);
        doc.rect(a[0], a[1], b[0] - a[0], b[1] - a[1], 'S');
        doc.setLineDashPattern([], 0);
        doc.setTextColor(190, 100, 0);
        doc.setFillColor(255, 255, 255);
        doc.rect(a[0] + 1, a[1] + 1, doc.getTextWidth(`Part ${p.label}`) + 1, 4, 'F');
        doc.text(`Part ${p.label}`, a[0] + 1.5, a[1] + 4);
        doc.setTextColor(0);
      }
      doc.setDrawColor(0);
    }
    if (view.part) {
      // Match lines where the part meets its neighbours.
      const w = view.window;
      const a: V2 = [view.cx + w.x0 / view.scale, view.cy - w.y1 / view.scale];
      const b: V2 = [view.cx + w.x1 / view.scale, view.cy - w.y0 / view.scale];
      doc.setDrawColor(190, 100, 0);
      doc.setLineWidth(0.35);
      doc.setLineDashPattern([2.5, 1, 0.5, 1], 0);
      doc.rect(a[0], a[1], b[0] - a[0], b[1] - a[1], 'S');
      doc.setLineDashPattern([], 0);
      doc.setDrawColor(0);
    }
    // Right-hand column.
    const x = colX + 3;
    const w = g.colW - 6;
    let y = g.margin + 2;
    y = drawLegend(doc, g, x, y, w) + 3;
    y = drawScaleAndAxes(doc, g, x, y, w, view.scale, units, design, axes) + 2;
    let cautionBottom = titleTop - 3;
    if (parts.length) {
      const keyH = g.paper === 'a3' ? 42 : 28;
      drawKeyPlan(doc, g, plan, parts, current, {
        x0: x,
        y0: titleTop - keyH - 2,
        x1: x + w,
        y1: titleTop - 3,
      });
      cautionBottom = titleTop - keyH - 4;
    }
    drawCautionBox(doc, g, x, y, w, cautionBottom, plan);
  };

  const fullView = centredView(points, chains, overviewScale, area);
  planSheet(needsParts ? 'Overview' : 'Plan', fullView, needsParts, null);
  for (const p of parts) planSheet(`Part ${p.label}`, p.view, false, p.label);

  const blocks: Block[] = [
    { kind: 'notes', title: 'Notes', items: planNotes(plan, design, units) },
    { kind: 'table', table: flagsTable(plan, units) },
    { kind: 'table', table: memberSchedule(plan, units) },
    { kind: 'table', table: footingSchedule(plan, design, units, axes.j) },
    { kind: 'table', table: cutListTable(plan, units, design.kerfMm) },
    { kind: 'table', table: quantitiesTable(plan) },
  ];
  flowBlocks(doc, g, blocks, {
    newSheet: () => {
      doc.addPage(paper, 'landscape');
      sheets.push({ title: 'Schedules', scale: 'not to scale' });
      drawBorder(doc, g);
    },
  });

  sheets.forEach((s, i) => {
    doc.setPage(i + 1);
    drawTitleBlock(doc, g, {
      meta,
      sheetTitle: s.title,
      scale: s.scale,
      sheet: i + 1,
      sheets: sheets.length,
    });
  });
  return new Uint8Array(doc.output('arraybuffer'));
}
