// Working data of one frame layout, in the rotated frame where boards run along +x and joists along +y. Types only.
import type { DesignDocument } from '../schema';
import type { MemberRole, Ply, Pt } from '../types';

/** How an outline edge meets the joists. */
export type EdgeKind =
  /** Runs with the joists: its rim is an edge joist. */
  | 'parallel'
  /** Runs with the boards (within 30 degrees): joists end on it and a support row runs under it. */
  | 'row'
  /** Crosses the joists at a steeper angle: joists end on it and its rim stands on pads. */
  | 'angled';

/** One outline edge in the layout frame, with its rim centreline. */
export interface EdgeInfo {
  index: number;
  a: Pt;
  b: Pt;
  length: number;
  /** Unit direction. */
  ux: number;
  uy: number;
  kind: EdgeKind;
  /** Rim centreline, half a joist width inside the edge (mitred at the corners). */
  rimA: Pt;
  rimB: Pt;
  /**
   * Whether the rim centreline stays on the deck: false where the deck is thinner than a joist
   * and the inset folded over (its ends or middle fall outside the outline).
   */
  rimInside: boolean;
}

/** A vertical joist line segment (one inside interval of one line). */
export interface JoistLine {
  /** Stable id shared by every piece cut from this line. */
  id: string;
  x: number;
  y0: number;
  y1: number;
  kind: 'joist' | 'rim';
  role: MemberRole;
  ply: Ply;
  /** Edge index each end butts against (-1 when the end is not on a rim). */
  endEdge: [number, number];
  /** Support positions strictly inside (y0, y1), sorted: crossings with support rows. */
  supports: number[];
  /** Whether each end stands on a support (a row under its rim, or a rim on pads). */
  endSupported: [boolean, boolean];
  /** Where each supported end bears: the support's centreline, just beyond the end. */
  bearY: [number, number];
  /** Filled by cutting: the member ids of the stock pieces, bottom to top, and their ranges. */
  pieces: { id: string; y0: number; y1: number }[];
}

/** A support row in the rotated frame. */
export interface RowSeg {
  id: string;
  a: Pt;
  b: Pt;
  kind: 'blocks' | 'beam' | 'wall';
  placed: boolean;
}

/** Everything the layout steps share. */
export interface FrameContext {
  design: DesignDocument;
  /** Outline in the rotated frame, counter-clockwise. */
  ring: Pt[];
  edges: EdgeInfo[];
  cos: number;
  sin: number;
  bounds: { minX: number; minY: number; maxX: number; maxY: number };
  /** Joist width (mm), used everywhere as the rim and joist thickness. */
  w: number;
  /** Largest distance between supports along a joist: the span limit, and no more than stock. */
  rowLimit: number;
  usePosts: boolean;
}

/** Converts a rotated-frame point back to world millimetres. */
export function toWorld(ctx: FrameContext, p: Pt): Pt {
  // Rotated frame = world rotated by -angle; back is +angle.
  return [p[0] * ctx.cos - p[1] * ctx.sin, p[0] * ctx.sin + p[1] * ctx.cos];
}
