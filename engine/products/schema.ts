// Catalogue product schema (zod), shared by the engine, the product API and the catalogue form. Touches nothing but zod.
import { z } from 'zod';

/** Kinds of catalogue product (models/ re-exports this list; the products table's CHECK mirrors it). */
export const PRODUCT_KINDS = [
  'joist',
  'beam',
  'board',
  'post',
  'block',
  'clip',
  'screw',
  'membrane',
  'fascia',
  'concrete',
  'other',
] as const;
export type ProductKind = (typeof PRODUCT_KINDS)[number];

/** Units a product is priced by. */
export const PRODUCT_UNITS = ['each', 'length', 'm', 'm2', 'm3', 'roll', 'pack'] as const;

/** Kinds that carry load along their length and so need a span table or material properties. */
export const SPANNING_KINDS: readonly ProductKind[] = ['joist', 'beam'];
/** Kinds bought in stock lengths. */
export const LENGTH_KINDS: readonly ProductKind[] = ['joist', 'beam', 'board', 'post', 'fascia'];

const mmField = (label: string) =>
  z
    .number({ error: `${label} must be a number of millimetres` })
    .finite(`${label} must be a finite number`)
    .positive(`${label} must be above 0`)
    .max(100_000, `${label} must be at most 100 000 mm`);

/** One row of a maker's span table: at these centres the member may span this far. */
export const spanTableRowSchema = z.object({
  centresMm: mmField('Centres'),
  maxSpanMm: mmField('Maximum span'),
  maxCantileverMm: z
    .number({ error: 'Maximum cantilever must be a number of millimetres' })
    .finite()
    .min(0, 'Maximum cantilever must be 0 or more')
    .max(100_000),
});

/** Material properties for an engineered span: allowable (working) stresses, not characteristic strengths. */
export const materialSchema = z.object({
  EMPa: z
    .number({ error: 'E must be a number (MPa)' })
    .finite()
    .positive('E must be above 0')
    .max(1_000_000),
  fbMPa: z
    .number({ error: 'Allowable bending stress must be a number (MPa)' })
    .finite()
    .positive('Allowable bending stress must be above 0')
    .max(1000),
  fvMPa: z
    .number({ error: 'Allowable shear stress must be a number (MPa)' })
    .finite()
    .positive('Allowable shear stress must be above 0')
    .max(1000),
  densityKgM3: z
    .number({ error: 'Density must be a number (kg/m³)' })
    .finite()
    .positive('Density must be above 0')
    .max(20_000)
    .optional(),
});

/** Largest joist centres a board may span: laid square to the joists, and at any other angle. */
export const boardMaxCentresSchema = z
  .object({
    straightMm: mmField('Maximum centres (square)'),
    angledMm: mmField('Maximum centres (angled)'),
  })
  .refine((v) => v.angledMm <= v.straightMm, {
    message: 'Angled centres cannot be wider than square centres',
    path: ['angledMm'],
  });

/** Sizes; extra keys (lengthMm, diameterMm, clip, border, packSize) depend on the kind. */
export const dimensionsSchema = z
  .object({
    widthMm: mmField('Width').optional(),
    depthMm: mmField('Depth').optional(),
    lengthMm: mmField('Length').optional(),
  })
  .catchall(z.union([z.number().finite(), z.string().max(100), z.boolean()]));

const productFields = {
  kind: z.enum(PRODUCT_KINDS, { error: 'Choose a kind of product' }),
  name: z
    .string({ error: 'Name is required' })
    .trim()
    .min(1, 'Name is required')
    .max(200, 'Name must be at most 200 characters'),
  sku: z
    .string({ error: 'SKU is required' })
    .trim()
    .min(1, 'SKU is required')
    .max(60, 'SKU must be at most 60 characters'),
  unit: z.enum(PRODUCT_UNITS, { error: 'Choose a unit' }).default('each'),
  unitPrice: z
    .number({ error: 'Price must be a number' })
    .finite()
    .min(0, 'Price cannot be negative')
    .max(1_000_000, 'Price must be at most 1 000 000')
    .refine(
      (v) => Math.abs(v * 100 - Math.round(v * 100)) < 1e-6,
      'Price has at most two decimals',
    ),
  stockLengthsMm: z
    .array(z.number().int('Stock lengths are whole millimetres').positive().max(100_000))
    .max(20, 'At most 20 stock lengths')
    .default([]),
  dimensions: dimensionsSchema.default({}),
  spanTable: z
    .array(spanTableRowSchema)
    .max(20, 'At most 20 span table rows')
    .nullable()
    .default(null),
  material: materialSchema.nullable().default(null),
  boardMaxCentres: boardMaxCentresSchema.nullable().default(null),
  active: z.boolean().default(true),
};

/** The fields the kind rules read; loose, because the rules also run when other fields failed. */
type ProductShape = {
  kind: ProductKind;
  stockLengthsMm?: unknown;
  dimensions?: unknown;
  spanTable?: unknown;
  material?: unknown;
  boardMaxCentres?: unknown;
};

/** Rules that depend on the kind: what a joist, beam or board must state for the checks. */
export function checkProductByKind(p: ProductShape, ctx: z.RefinementCtx): void {
  const issue = (path: string[], message: string) =>
    ctx.addIssue({ code: 'custom', path, message });
  const dims = (typeof p.dimensions === 'object' && p.dimensions !== null ? p.dimensions : {}) as {
    widthMm?: unknown;
    depthMm?: unknown;
  };
  const stock = Array.isArray(p.stockLengthsMm) ? p.stockLengthsMm : [];
  const table = Array.isArray(p.spanTable) ? (p.spanTable as { centresMm?: unknown }[]) : [];
  if (SPANNING_KINDS.includes(p.kind) || p.kind === 'board') {
    if (dims.widthMm === undefined) issue(['dimensions', 'widthMm'], 'Width is required');
    if (dims.depthMm === undefined) issue(['dimensions', 'depthMm'], 'Depth is required');
  }
  if (LENGTH_KINDS.includes(p.kind) && stock.length === 0) {
    issue(['stockLengthsMm'], 'Give at least one stock length');
  }
  if (SPANNING_KINDS.includes(p.kind)) {
    if (table.length === 0 && !p.material) {
      issue(['spanTable'], 'Give the maker’s span table or the material properties');
    }
    const centres = table.map((r) => r?.centresMm);
    if (new Set(centres).size !== centres.length) {
      issue(['spanTable'], 'Each span table row needs different centres');
    }
  }
  if (p.kind === 'board' && !p.boardMaxCentres) {
    issue(['boardMaxCentres'], 'Give the board’s maximum joist centres');
  }
}

// The kind rules run even when other fields failed, so the form shows every missing piece at once.
const kindRulesApply = (payload: { value: unknown }) => {
  const v = payload.value as { kind?: unknown } | null;
  return typeof v === 'object' && v !== null && PRODUCT_KINDS.includes(v.kind as ProductKind);
};

/** A product as the owner enters it (create); the same schema validates the form and the API. */
export const productInputSchema = z
  .object(productFields)
  .superRefine((p, ctx) => checkProductByKind(p, ctx), { when: kindRulesApply });

/** A change to a product: any fields; the merged product is checked again with productInputSchema. */
export const productPatchSchema = z
  .object({
    kind: productFields.kind,
    name: productFields.name,
    sku: productFields.sku,
    unit: z.enum(PRODUCT_UNITS, { error: 'Choose a unit' }),
    unitPrice: productFields.unitPrice,
    stockLengthsMm: z.array(z.number().int().positive().max(100_000)).max(20),
    dimensions: dimensionsSchema,
    spanTable: z.array(spanTableRowSchema).max(20).nullable(),
    material: materialSchema.nullable(),
    boardMaxCentres: boardMaxCentresSchema.nullable(),
    active: z.boolean(),
  })
  .partial()
  .strict();

export type ProductInput = z.input<typeof productInputSchema>;
export type ProductValues = z.output<typeof productInputSchema>;
export type ProductPatch = z.output<typeof productPatchSchema>;
export type SpanTableRow = z.output<typeof spanTableRowSchema>;
export type ProductMaterial = z.output<typeof materialSchema>;
export type BoardMaxCentres = z.output<typeof boardMaxCentresSchema>;

/** A catalogue product as the engine and API see it: the stored values plus its id. */
export interface CatalogueProduct extends ProductValues {
  id: string;
}
