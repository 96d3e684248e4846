// Outline commands: draw corners, close the shape, move/insert/delete corners, exact side length and angle.
import type { DesignDocument } from '@/engine/schema';
import type { Pt } from '@/engine/types';
import { angleOf, dist, isSimple, mid, polar, round, sideOf } from '../geometry';
import { deg } from '../spaces';
import { defineCommand } from './types';

const samePt = (a: Pt, b: Pt) => a[0] === b[0] && a[1] === b[1];

/** Places a corner of the outline being drawn (UI only until the shape is closed). */
export const addDrawingCorner = defineCommand<{ at: Pt }>({
  id: 'outline.addCorner',
  label: 'Place corner',
  edits: true,
  predicate: (s) => s.ui.tool === 'outline',
  perform: (s, { at }) => {
    const last = s.ui.drawing[s.ui.drawing.length - 1];
    if (last && samePt(last, at)) return null;
    return { ui: { drawing: [...s.ui.drawing, [round(at[0]), round(at[1])]] } };
  },
});

/** Adds the next side of the outline being drawn from a typed length and direction. */
export const addDrawingSide = defineCommand<{ lengthMm: number; angleDeg: number }>({
  id: 'outline.addSide',
  label: 'Add side',
  edits: true,
  predicate: (s, a) => s.ui.tool === 'outline' && s.ui.drawing.length > 0 && a.lengthMm > 0,
  perform: (s, { lengthMm, angleDeg }) => {
    const last = s.ui.drawing[s.ui.drawing.length - 1];
    const next = polar(last, lengthMm, deg(angleDeg));
    // Typing the last side back onto the first corner closes the shape.
    if (s.ui.drawing.length >= 3 && dist(next, s.ui.drawing[0]) < 1) {
      return closeOutline.perform(s, undefined);
    }
    return { ui: { drawing: [...s.ui.drawing, next] } };
  },
});

/** Takes back the last corner placed while drawing. */
export const removeDrawingCorner = defineCommand({
  id: 'outline.removeCorner',
  label: 'Take back corner',
  edits: true,
  predicate: (s) => s.ui.tool === 'outline' && s.ui.drawing.length > 0,
  perform: (s) => ({ ui: { drawing: s.ui.drawing.slice(0, -1) } }),
});

/** Closes the outline being drawn: it replaces the deck edge (support rows and steps start afresh). */
export const closeOutline = defineCommand({
  id: 'outline.close',
  label: 'Close outline',
  edits: true,
  predicate: (s) => s.ui.tool === 'outline' && s.ui.drawing.length >= 3 && isSimple(s.ui.drawing),
  perform: (s) => {
    if (s.ui.drawing.length < 3 || !isSimple(s.ui.drawing)) return null;
    const doc: DesignDocument = { ...s.doc, outline: s.ui.drawing, supports: [], steps: [] };
    return {
      doc,
      ui: { drawing: [], cursor: null, tool: 'select', toolState: 'idle', selection: null },
    };
  },
});

/** Moves one corner (a drag calls this on every move inside one history mark). */
export const moveCorner = defineCommand<{ index: number; to: Pt }>({
  id: 'outline.moveCorner',
  label: 'Move corner',
  edits: true,
  predicate: (s, a) => a.index >= 0 && a.index < s.doc.outline.length,
  perform: (s, { index, to }) => {
    const cur = s.doc.outline[index];
    if (!cur || samePt(cur, to)) return null;
    const outline = s.doc.outline.slice();
    outline[index] = [round(to[0]), round(to[1])];
    return { doc: { ...s.doc, outline } };
  },
});

/** Inserts a corner in the middle of a side. */
export const insertCorner = defineCommand<{ side: number; at?: Pt }>({
  id: 'outline.insertCorner',
  label: 'Insert corner',
  edits: true,
  predicate: (s, a) => a.side >= 0 && a.side < s.doc.outline.length && s.doc.outline.length < 200,
  perform: (s, { side, at }) => {
    const [p, q] = sideOf(s.doc.outline, side);
    const pt = at ?? mid(p, q);
    const outline = s.doc.outline.slice();
    outline.splice(side + 1, 0, [round(pt[0]), round(pt[1])]);
    const steps = s.doc.steps.map((st) => (st.edge > side ? { ...st, edge: st.edge + 1 } : st));
    return {
      doc: { ...s.doc, outline, steps },
      ui: { selection: { kind: 'corner', index: side + 1 } },
    };
  },
});

/** Deletes a corner; the two sides meeting there become one. A deck keeps at least three corners. */
export const deleteCorner = defineCommand<{ index: number }>({
  id: 'outline.deleteCorner',
  label: 'Delete corner',
  edits: true,
  predicate: (s, a) => s.doc.outline.length > 3 && a.index >= 0 && a.index < s.doc.outline.length,
  perform: (s, { index }) => {
    if (s.doc.outline.length <= 3) return null;
    const outline = s.doc.outline.filter((_, i) => i !== index);
    // Side `index` disappears; the side before it now runs across the removed corner.
    const steps = s.doc.steps
      .filter((st) => st.edge !== index)
      .map((st) => (st.edge > index ? { ...st, edge: st.edge - 1 } : st));
    return { doc: { ...s.doc, outline, steps }, ui: { selection: null } };
  },
});

/**
 * Sets a side's exact length and/or direction, measured from its first corner. With `moveNext`
 * (the default on four or more corners) the following corner moves by the same amount, so the next
 * side keeps its direction and length: the side's far wall is pushed out, as on site.
 */
export const setSide = defineCommand<{
  index: number;
  lengthMm?: number;
  angleDeg?: number;
  moveNext?: boolean;
}>({
  id: 'outline.setSide',
  label: 'Set side length and angle',
  edits: true,
  predicate: (s, a) =>
    a.index >= 0 &&
    a.index < s.doc.outline.length &&
    (a.lengthMm === undefined || (Number.isFinite(a.lengthMm) && a.lengthMm > 0)) &&
    (a.angleDeg === undefined || Number.isFinite(a.angleDeg)),
  perform: (s, { index, lengthMm, angleDeg, moveNext }) => {
    const n = s.doc.outline.length;
    const [p, q] = sideOf(s.doc.outline, index);
    const len = lengthMm ?? dist(p, q);
    const ang = angleDeg ?? angleOf(p, q);
    const target = polar(p, len, deg(ang));
    const delta: Pt = [target[0] - q[0], target[1] - q[1]];
    if (delta[0] === 0 && delta[1] === 0) return null;
    const outline = s.doc.outline.slice();
    const j = (index + 1) % n;
    outline[j] = target;
    const k = (index + 2) % n;
    if ((moveNext ?? n >= 4) && k !== index) {
      outline[k] = [round(outline[k][0] + delta[0]), round(outline[k][1] + delta[1])];
    }
    return { doc: { ...s.doc, outline } };
  },
});

export const outlineCommands = [
  addDrawingCorner,
  addDrawingSide,
  removeDrawingCorner,
  closeOutline,
  moveCorner,
  insertCorner,
  deleteCorner,
  setSide,
] as const;
