// Query schemas for the framing plan and materials downloads, shared by the routes and the materials panel.
import { z } from 'zod';

/** Waste allowance on counted items when none is given (common practice, a default the user changes). */
export const DEFAULT_WASTE_PCT = 10;

export const paperSchema = z.enum(['a4', 'a3'], { error: 'Paper must be a4 or a3' });

/** GET /api/designs/[id]/plan */
export const planQuerySchema = z.object({
  paper: paperSchema.default('a4'),
});

/** GET /api/designs/[id]/materials */
export const materialsQuerySchema = z.object({
  format: z.enum(['json', 'csv'], { error: 'Format must be json or csv' }).default('json'),
  wastePct: z.coerce
    .number({ error: 'Waste must be a number of percent' })
    .finite('Waste must be a number of percent')
    .min(0, 'Waste cannot be below 0%')
    .max(100, 'Waste cannot be above 100%')
    .default(DEFAULT_WASTE_PCT),
});

export type PlanQuery = z.output<typeof planQuerySchema>;
export type MaterialsQuery = z.output<typeof materialsQuerySchema>;

/** Turns URLSearchParams into a plain object for the schemas (empty values count as missing). */
export function queryObject(params: URLSearchParams): Record<string, string> {
  const out: Record<string, string> = {};
  params.forEach((v, k) => {
    if (v !== '') out[k] = v;
  });
  return out;
}

/** The download links the materials panel offers. */
export function planUrl(designId: string, paper: 'a4' | 'a3'): string {
  return `/api/designs/${encodeURIComponent(designId)}/plan?paper=${paper}`;
}

export function materialsUrl(
  designId: string,
  opts: { wastePct: number; format?: 'json' | 'csv' },
) {
  const q = new URLSearchParams({ wastePct: String(opts.wastePct) });
  if (opts.format === 'csv') q.set('format', 'csv');
  return `/api/designs/${encodeURIComponent(designId)}/materials?${q.toString()}`;
}
