// The framing plan's tables as plain rows of text: member, footing, cut list, quantities, flags, notes.
import { STANDING_CAUTION } from '@/engine/codes';
import type { DesignDocument } from '@/engine/schema';
import type {
  CutListResult,
  FramePlan,
  Member,
  Flag,
  MemberRole,
  Severity,
  SupportRowPlan,
} from '@/engine/types';
import type { UnitSystem } from '@/lib/units';
import { len, pdfText } from './text';

export interface Column {
  label: string;
  /** Relative width; the table shares its column width out in proportion. */
  width: number;
  align?: 'left' | 'right';
}

export interface Table {
  title: string;
  columns: Column[];
  rows: string[][];
  /** Lines printed under the table. */
  notes?: string[];
}

/** Block laid flat: 440 x 215 x 100 mm (common UK size; PRODUCT.md, common practice). */
export const BLOCK = { lengthMm: 440, widthMm: 215, thicknessMm: 100 } as const;
/** Wet concrete bed under the blocks (common practice). */
export const BED_MM = 100;
/** Trench bottom below block top: block thickness + bed (common practice: 100 + 100 = 200 mm). */
export const TRENCH_BELOW_BLOCK_TOP_MM = BLOCK.thicknessMm + BED_MM;
/** Shortest post hole (from memory; common practice buries about a third of a post, at least 600 mm). */
export const MIN_POST_HOLE_MM = 600;

/** The cautions every plan carries (PRODUCT.md: safety), in the engine's words. */
export const CAUTIONS: readonly string[] = [STANDING_CAUTION];

const SEVERITY_ORDER: Record<Severity, number> = { error: 0, warning: 1, info: 2 };

function roleWords(m: Member): string {
  const role: MemberRole | undefined = m.role;
  switch (m.kind) {
    case 'joist':
      if (role === 'butt-pair') return 'Joist, pair under butt joint';
      if (role === 'border') return 'Joist under border course';
      if (role === 'stair') return 'Step joist';
      if (role === 'edge') return 'Edge joist';
      return 'Joist';
    case 'rim':
      return role === 'stair' ? 'Step rim' : 'Rim';
    case 'noggin':
      return role === 'stair' ? 'Step noggin' : 'Noggin';
    case 'support':
      return 'Support row';
    case 'post':
      return 'Post';
    case 'pad':
      return 'Pad';
    default: {
      const never: never = m.kind;
      throw new Error(`Unknown member kind ${String(never)}`);
    }
  }
}

const PLY_WORDS = { 1: 'single', 2: 'double', 3: 'triple' } as const;
const MARK_PREFIX = { joist: 'J', rim: 'R', noggin: 'N' } as const;

/** Member schedule: frame members grouped by kind, role, ply and length (to the mm). */
export function memberSchedule(plan: FramePlan, units: UnitSystem): Table {
  const groups = new Map<
    string,
    {
      kind: 'joist' | 'rim' | 'noggin';
      words: string;
      ply: 1 | 2 | 3;
      lengthMm: number;
      count: number;
    }
  >();
  for (const m of plan.members) {
    if (m.kind !== 'joist' && m.kind !== 'rim' && m.kind !== 'noggin') continue;
    const lengthMm = Math.round(m.lengthMm);
    const words = roleWords(m);
    const key = `${m.kind}|${words}|${m.ply}|${lengthMm}`;
    const g = groups.get(key);
    if (g) g.count += 1;
    else groups.set(key, { kind: m.kind, words, ply: m.ply, lengthMm, count: 1 });
  }
  const kindOrder = { joist: 0, rim: 1, noggin: 2 } as const;
  const sorted = [...groups.values()].sort(
    (a, b) =>
      kindOrder[a.kind] - kindOrder[b.kind] ||
      a.words.localeCompare(b.words) ||
      b.ply - a.ply ||
      b.lengthMm - a.lengthMm,
  );
  const counters = { joist: 0, rim: 0, noggin: 0 };
  const rows = sorted.map((g) => {
    counters[g.kind] += 1;
    return [
      `${MARK_PREFIX[g.kind]}${counters[g.kind]}`,
      g.words,
      PLY_WORDS[g.ply],
      len(g.lengthMm, units),
      String(g.count),
      len(g.lengthMm * g.count, units),
    ];
  });
  return {
    title: 'Member schedule',
    columns: [
      { label: 'Mark', width: 0.7 },
      { label: 'Member', width: 3 },
      { label: 'Ply', width: 1 },
      { label: 'Length', width: 1.4, align: 'right' },
      { label: 'No.', width: 0.7, align: 'right' },
      { label: 'Total', width: 1.5, align: 'right' },
    ],
    rows,
    notes: [
      'Each line counts single pieces at their cut length; a double or triple joist is two or three pieces side by side.',
    ],
  };
}

/**
 * The support rows in the order the crew meets them along the joists, each with its distance from
 * the datum (the deck edge where the joists start). Row numbers on the plan and schedule follow it.
 */
export function orderedSupportRows(
  plan: FramePlan,
  joistDir: [number, number],
): { row: SupportRowPlan; atMm: number }[] {
  const proj = (p: [number, number]) => p[0] * joistDir[0] + p[1] * joistDir[1];
  const datum = Math.min(...plan.outline.map(proj));
  return plan.supportRows
    .map((row) => ({ row, atMm: (proj(row.a) + proj(row.b)) / 2 - datum }))
    .sort((a, b) => a.atMm - b.atMm);
}

/** Footing schedule: support rows, pads and posts with block counts and trench or hole depths. */
export function footingSchedule(
  plan: FramePlan,
  design: DesignDocument,
  units: UnitSystem,
  joistDir: [number, number],
): Table {
  const rows: string[][] = [];
  const trench = len(TRENCH_BELOW_BLOCK_TOP_MM, units);
  orderedSupportRows(plan, joistDir).forEach(({ row: r, atMm }, i) => {
    const lengthMm = Math.hypot(r.b[0] - r.a[0], r.b[1] - r.a[1]);
    const at = `at ${len(atMm, units)}`;
    switch (r.kind) {
      case 'blocks':
        rows.push([
          `Row ${i + 1}`,
          `Blocks flat on ${len(BED_MM, units)} bed, ${at}`,
          len(lengthMm, units),
          String(Math.ceil(lengthMm / BLOCK.lengthMm)),
          `${trench} below block top`,
        ]);
        break;
      case 'beam':
        rows.push([`Row ${i + 1}`, `Beam on posts, ${at}`, len(lengthMm, units), '-', 'see Posts']);
        break;
      case 'wall':
        rows.push([
          `Row ${i + 1}`,
          `Wall plate fixed to wall, ${at}`,
          len(lengthMm, units),
          '-',
          'none',
        ]);
        break;
      default: {
        const never: never = r.kind;
        throw new Error(`Unknown support kind ${String(never)}`);
      }
    }
  });
  const pads = plan.members.filter((m) => m.kind === 'pad');
  if (pads.length) {
    rows.push([
      'Pads',
      `Block ${BLOCK.lengthMm} x ${BLOCK.widthMm} x ${BLOCK.thicknessMm} mm flat on ${len(BED_MM, units)} bed`,
      '-',
      String(pads.length),
      `${trench} below block top`,
    ]);
  }
  const posts = plan.members.filter((m) => m.kind === 'post');
  // Group posts by their height to the joist underside, to the nearest 10 mm.
  const byHeight = new Map<number, number>();
  for (const p of posts) {
    const above = Math.max(
      0,
      Math.round(((p.heightMm ?? design.heightMm) - design.joist.depthMm) / 10) * 10,
    );
    byHeight.set(above, (byHeight.get(above) ?? 0) + 1);
  }
  [...byHeight.entries()]
    .sort((a, b) => a[0] - b[0])
    .forEach(([above, count]) => {
      const hole = Math.max(MIN_POST_HOLE_MM, Math.ceil(above / 2 / 50) * 50);
      rows.push([
        'Posts',
        `Post, ${len(above, units)} above ground to joist underside, set in concrete`,
        len(above + hole, units),
        String(count),
        `hole ${len(hole, units)} deep`,
      ]);
    });
  return {
    title: 'Footing schedule',
    columns: [
      { label: 'Item', width: 0.9 },
      { label: 'Description', width: 3.4 },
      { label: 'Length', width: 1.2, align: 'right' },
      { label: 'No.', width: 0.7, align: 'right' },
      { label: 'Dig to', width: 1.9 },
    ],
    rows,
    notes: [
      `Blocks ${BLOCK.lengthMm} x ${BLOCK.widthMm} x ${BLOCK.thicknessMm} mm laid flat on a ${BED_MM} mm wet concrete bed: trench bottom ${TRENCH_BELOW_BLOCK_TOP_MM} mm below block top (common practice).`,
      `Post holes: at least ${MIN_POST_HOLE_MM} mm or half the height above ground (a third of the post buried), whichever is deeper (from memory; common practice). The post maker or engineer may ask for more.`,
      'Set block tops so the joists bear fully; pack only with the maker’s packers.',
    ],
  };
}

function cutRows(label: string, r: CutListResult, units: UnitSystem): string[][] {
  const groups = new Map<
    string,
    { stockMm: number; cuts: number[]; offcutMm: number; fromOffcut: boolean; n: number }
  >();
  for (const s of r.stock) {
    const cuts = [...s.cuts].sort((a, b) => b - a);
    const key = `${s.stockMm}|${cuts.join(',')}|${Math.round(s.offcutMm)}|${s.fromOffcut ? 1 : 0}`;
    const g = groups.get(key);
    if (g) g.n += 1;
    else
      groups.set(key, {
        stockMm: s.stockMm,
        cuts,
        offcutMm: s.offcutMm,
        fromOffcut: !!s.fromOffcut,
        n: 1,
      });
  }
  return [...groups.values()]
    .sort((a, b) => b.stockMm - a.stockMm || b.cuts[0] - a.cuts[0])
    .map((g) => [
      label,
      `${len(g.stockMm, units)}${g.fromOffcut ? ' (offcut)' : ''}`,
      String(g.n),
      g.cuts.map((c) => len(c, units)).join(' + '),
      len(g.offcutMm, units),
    ]);
}

/** Cut list: each stock pattern with how many to cut, its cuts and its offcut. */
export function cutListTable(plan: FramePlan, units: UnitSystem, kerfMm: number): Table {
  const parts: [string, CutListResult | undefined][] = [
    ['Joists', plan.cutList.joists],
    ['Boards', plan.cutList.boards],
    ['Border', plan.cutList.borderBoards],
  ];
  const rows: string[][] = [];
  const notes: string[] = [];
  for (const [label, r] of parts) {
    if (!r || !r.stock.length) continue;
    rows.push(...cutRows(label, r, units));
    notes.push(
      `${label}: ${r.count} stock piece${r.count === 1 ? '' : 's'} (lower bound ${r.lowerBound}${r.optimal ? ', proven fewest' : ''}).`,
    );
  }
  notes.push(`Saw kerf ${len(kerfMm, units)} allowed between cuts.`);
  return {
    title: 'Cut list',
    columns: [
      { label: 'For', width: 0.9 },
      { label: 'Stock', width: 1.2, align: 'right' },
      { label: 'No.', width: 0.6, align: 'right' },
      { label: 'Cuts', width: 4 },
      { label: 'Offcut', width: 1.1, align: 'right' },
    ],
    rows,
    notes,
  };
}

function qtyText(qty: number, unit: string): string {
  const n = Number.isInteger(qty) ? String(qty) : qty.toFixed(2);
  switch (unit) {
    case 'm2':
      return `${n} m²`;
    case 'm3':
      return `${n} m³`;
    case 'm':
      return `${n} m`;
    case 'length':
      return `${n} lengths`;
    default:
      return n;
  }
}

/** Quantities (unpriced) for the crew: what should arrive on site. */
export function quantitiesTable(plan: FramePlan): Table {
  return {
    title: 'Materials to site',
    columns: [
      { label: 'Item', width: 3 },
      { label: 'Qty', width: 1.2, align: 'right' },
      { label: 'Basis', width: 3.4 },
    ],
    rows: plan.quantities.map((q) => [pdfText(q.label), qtyText(q.qty, q.unit), pdfText(q.basis)]),
  };
}

/** The flags that need the crew's attention (not the standing caution), worst first. */
export function sortedFlags(plan: FramePlan): FramePlan['flags'] {
  return plan.flags
    .filter((f) => f.code !== 'caution')
    .map((f, i) => ({ f, i }))
    .sort((a, b) => SEVERITY_ORDER[a.f.severity] - SEVERITY_ORDER[b.f.severity] || a.i - b.i)
    .map(({ f }) => f);
}

/** One numbered check: identical findings (same check, same words) share a number and a row. */
export interface NumberedCheck {
  n: number;
  flag: Flag;
  places: Flag[];
}

/** Flags folded into numbered checks; the plan's markers carry these numbers. */
export function numberedChecks(plan: FramePlan): NumberedCheck[] {
  const byKey = new Map<string, NumberedCheck>();
  const out: NumberedCheck[] = [];
  for (const f of sortedFlags(plan)) {
    const key = `${f.code}|${f.severity}|${f.message}`;
    const seen = byKey.get(key);
    if (seen) seen.places.push(f);
    else {
      const c = { n: out.length + 1, flag: f, places: [f] };
      byKey.set(key, c);
      out.push(c);
    }
  }
  return out;
}

/** The flags as a table (numbers match the markers on the plan). */
export function flagsTable(plan: FramePlan, units: UnitSystem): Table {
  const rows = numberedChecks(plan).map(({ n, flag: f, places }) => [
    String(n),
    f.severity === 'error' ? 'ERROR' : f.severity === 'warning' ? 'Warning' : 'Info',
    // The engine words its messages in mm; imperial readers also get the figures in their units.
    pdfText(f.message) +
      (units === 'imperial' && f.valueMm !== undefined && f.limitMm !== undefined
        ? ` (${len(f.valueMm, units)} against ${len(f.limitMm, units)})`
        : '') +
      (places.length > 1 ? ` (${places.length} places)` : ''),
    pdfText(f.source ?? ''),
  ]);
  return {
    title: 'Checks to resolve',
    columns: [
      { label: '#', width: 0.4 },
      { label: 'Level', width: 0.9 },
      { label: 'What', width: 3.8 },
      { label: 'Source', width: 2.6 },
    ],
    rows: rows.length ? rows : [['-', '-', 'No errors or warnings from the checks.', '']],
  };
}

/** The plan's notes: cautions first, then how to read the drawing. */
export function planNotes(plan: FramePlan, design: DesignDocument, units: UnitSystem): string[] {
  const errors = plan.flags.filter((f) => f.severity === 'error').length;
  const warnings = plan.flags.filter((f) => f.severity === 'warning').length;
  const notes = [...CAUTIONS];
  if (errors || warnings)
    notes.push(
      `${errors} error${errors === 1 ? '' : 's'} and ${warnings} warning${warnings === 1 ? '' : 's'} from the checks: see "Checks to resolve". Do not build until the errors are cleared.`,
    );
  notes.push(
    'Work to the figured dimensions; do not scale from the print.',
    `Joists at ${len(design.joistCentresMm, units)} centres; ${design.joist.widthMm} x ${design.joist.depthMm} mm; joins only over a support row.`,
    `Board gaps: ${len(design.board.gapMm, units)} side, ${len(design.board.endGapMm, units)} at butt joints; every butt joint over a pair of joists.`,
    'Pre-drill plastic joists for screws; a hidden clip at every board/joist crossing.',
  );
  plan.steps.forEach((st, i) =>
    notes.push(
      `Step ${i + 1} (S${i + 1} on the plan): ${st.count} tread${st.count === 1 ? '' : 's'} of ${st.treadBoards} boards, rise ${len(st.riseMm, units)}, going ${len(st.goingMm, units)}; tread tops ${st.levelsMm.map((l) => len(l, units)).join(', ')} above ground. Frame steps at ${len(design.stairCentresMm, units)} centres.`,
    ),
  );
  return notes.map(pdfText);
}
