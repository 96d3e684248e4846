// How each kind of frame member is drawn: our own colours and strokes, shared by the canvas and the legend.
import type { Member, MemberKind, Ply, Severity } from '@/engine/types';
import type { SupportRowInput } from '@/engine/schema';
import { exhaustive } from '../../exhaustive';

export interface StrokeStyle {
  color: string;
  /** Width in world mm (drawn at least minPx wide). */
  widthMm: number;
  minPx: number;
  dash?: number[];
  /** Parallel strokes, for laminated joists. */
  strokes: number;
}

export const palette = {
  paper: '#f6f3ec',
  gridMinor: 'rgba(107, 98, 87, 0.10)',
  gridMajor: 'rgba(107, 98, 87, 0.24)',
  deckFill: 'rgba(212, 152, 88, 0.10)',
  outline: '#3d3833',
  drawing: '#a65f26',
  board: 'rgba(214, 178, 128, 0.55)',
  boardEdge: 'rgba(138, 79, 31, 0.35)',
  borderBoard: 'rgba(166, 95, 38, 0.55)',
  joist: '#2f5d51',
  joistPair: '#1f6fa8',
  joistTriple: '#7a3fa0',
  rim: '#6a3e21',
  noggin: '#d9662a',
  supportBlocks: 'rgba(133, 124, 112, 0.45)',
  supportBeam: '#554e46',
  supportWall: '#29251f',
  pad: '#a89f92',
  padEdge: '#554e46',
  post: '#1a1714',
  step: 'rgba(63, 127, 174, 0.14)',
  stepEdge: '#1f4966',
  dimension: '#1d3a33',
  handle: '#ffffff',
  handleEdge: '#24493f',
  selected: '#c07c3a',
  larchAccent: '#a65f26',
  error: '#b3261e',
  warning: '#c07c3a',
  info: '#3f7fae',
} as const;

/** The stroke for a member of this kind and ply. */
export function memberStyle(kind: MemberKind, ply: Ply = 1): StrokeStyle {
  switch (kind) {
    case 'joist':
      return {
        color: ply === 3 ? palette.joistTriple : ply === 2 ? palette.joistPair : palette.joist,
        widthMm: 50,
        minPx: 1.25,
        strokes: ply,
      };
    case 'rim':
      return { color: palette.rim, widthMm: 50, minPx: 2.5, strokes: 1 };
    case 'noggin':
      return { color: palette.noggin, widthMm: 50, minPx: 2, strokes: 1 };
    case 'support':
      return { color: palette.supportBeam, widthMm: 100, minPx: 2, strokes: 1, dash: [6, 4] };
    case 'pad':
      return { color: palette.pad, widthMm: 215, minPx: 7, strokes: 1 };
    case 'post':
      return { color: palette.post, widthMm: 100, minPx: 7, strokes: 1 };
    default:
      return exhaustive(kind);
  }
}

/** The style key of a member: the canvas batches members with equal keys into one path. */
export function memberKey(m: Pick<Member, 'kind' | 'ply'>): string {
  return `${m.kind}:${m.ply}`;
}

/** The band drawn for a support row of each kind. */
export function supportRowStyle(kind: SupportRowInput['kind']): StrokeStyle {
  switch (kind) {
    case 'blocks':
      return { color: palette.supportBlocks, widthMm: 215, minPx: 6, strokes: 1 };
    case 'beam':
      return { color: palette.supportBeam, widthMm: 100, minPx: 4, strokes: 1 };
    case 'wall':
      return { color: palette.supportWall, widthMm: 100, minPx: 5, strokes: 1, dash: [3, 3] };
    default:
      return exhaustive(kind);
  }
}

export function severityColor(s: Severity): string {
  switch (s) {
    case 'error':
      return palette.error;
    case 'warning':
      return palette.warning;
    case 'info':
      return palette.info;
    default:
      return exhaustive(s);
  }
}

/** Legend rows, in the order the panel lists them. */
export const legendItems: {
  label: string;
  swatch: 'line' | 'double' | 'triple' | 'band' | 'square' | 'dot' | 'fill' | 'dashed';
  color: string;
}[] = [
  { label: 'Joist', swatch: 'line', color: palette.joist },
  { label: 'Paired joist (board butt joint)', swatch: 'double', color: palette.joistPair },
  { label: 'Triple joist (border course)', swatch: 'triple', color: palette.joistTriple },
  { label: 'Rim', swatch: 'line', color: palette.rim },
  { label: 'Noggin row', swatch: 'dashed', color: palette.noggin },
  { label: 'Support row: blocks', swatch: 'band', color: palette.supportBlocks },
  { label: 'Support row: beam', swatch: 'line', color: palette.supportBeam },
  { label: 'Support row: wall', swatch: 'dashed', color: palette.supportWall },
  { label: 'Pad', swatch: 'square', color: palette.pad },
  { label: 'Post', swatch: 'dot', color: palette.post },
  { label: 'Boards', swatch: 'fill', color: palette.board },
  { label: 'Steps', swatch: 'fill', color: palette.step },
];
