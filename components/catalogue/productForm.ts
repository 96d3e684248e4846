// The catalogue form's state as text, and its conversion to a product input (lengths typed in the user's units).
import { formatLength, parseLength, type UnitSystem } from '@/lib/units';
import {
  productInputSchema,
  type ProductDto,
  type ProductInput,
  type ProductKind,
} from '@/lib/validation/product';
import type { FieldErrors } from '@/components/ui/fieldErrors';
import { issuesToFieldErrors } from '@/components/ui/fieldErrors';

export interface SpanRowText {
  centres: string;
  span: string;
  cantilever: string;
}

/** Everything the form edits, as the person typed it. */
export interface ProductFormState {
  kind: ProductKind;
  name: string;
  sku: string;
  unit: string;
  unitPrice: string;
  stockLengths: string;
  width: string;
  depth: string;
  length: string;
  spanRows: SpanRowText[];
  EMPa: string;
  fbMPa: string;
  fvMPa: string;
  densityKgM3: string;
  straightCentres: string;
  angledCentres: string;
  active: boolean;
  /** Keys of `dimensions` the form does not edit (clip, border, diameterMm…), kept as they were. */
  extraDimensions: Record<string, string | number | boolean>;
}

const EDITED_DIMENSIONS = ['widthMm', 'depthMm', 'lengthMm'];

/** The unit a kind is usually priced by, for a new product. */
export function defaultUnitFor(kind: ProductKind): string {
  switch (kind) {
    case 'joist':
    case 'beam':
    case 'board':
    case 'post':
    case 'fascia':
      return 'length';
    case 'membrane':
      return 'roll';
    case 'concrete':
      return 'm3';
    case 'block':
    case 'clip':
    case 'screw':
    case 'other':
      return 'each';
    default: {
      const never: never = kind;
      return never;
    }
  }
}

/** Form state for a new product of a kind, or for editing an existing one. */
export function toFormState(
  p: ProductDto | null,
  units: UnitSystem,
  kind: ProductKind = 'joist',
): ProductFormState {
  const len = (mm: number | undefined) =>
    mm === undefined ? '' : formatLength(mm, units).replace(/\u2009/g, '');
  if (!p) {
    return {
      kind,
      name: '',
      sku: '',
      unit: defaultUnitFor(kind),
      unitPrice: '',
      stockLengths: '',
      width: '',
      depth: '',
      length: '',
      spanRows: [],
      EMPa: '',
      fbMPa: '',
      fvMPa: '',
      densityKgM3: '',
      straightCentres: '',
      angledCentres: '',
      active: true,
      extraDimensions: {},
    };
  }
  const extra: Record<string, string | number | boolean> = {};
  for (const [k, v] of Object.entries(p.dimensions)) {
    if (
      !EDITED_DIMENSIONS.includes(k) &&
      (typeof v === 'string' || typeof v === 'number' || typeof v === 'boolean')
    ) {
      extra[k] = v;
    }
  }
  return {
    kind: p.kind,
    name: p.name,
    sku: p.sku,
    unit: p.unit,
    unitPrice: p.unitPrice.toFixed(2),
    stockLengths: p.stockLengthsMm.map((mm) => len(mm)).join(', '),
    width: len(p.dimensions.widthMm),
    depth: len(p.dimensions.depthMm),
    length: len(p.dimensions.lengthMm),
    spanRows: (p.spanTable ?? []).map((r) => ({
      centres: len(r.centresMm),
      span: len(r.maxSpanMm),
      cantilever: len(r.maxCantileverMm),
    })),
    EMPa: p.material ? String(p.material.EMPa) : '',
    fbMPa: p.material ? String(p.material.fbMPa) : '',
    fvMPa: p.material ? String(p.material.fvMPa) : '',
    densityKgM3: p.material?.densityKgM3 !== undefined ? String(p.material.densityKgM3) : '',
    straightCentres: len(p.boardMaxCentres?.straightMm),
    angledCentres: len(p.boardMaxCentres?.angledMm),
    active: p.active,
    extraDimensions: extra,
  };
}

/** Whether the kind shows the structural sections of the form. */
export const showsSpan = (kind: ProductKind) => kind === 'joist' || kind === 'beam';
export const showsBoard = (kind: ProductKind) => kind === 'board';

/**
 * Turns the typed form into a product input and checks it with the shared schema. Returns the input
 * when it is valid, else the field errors (keyed like the API's, e.g. "spanTable.0.maxSpanMm").
 */
export function fromFormState(
  s: ProductFormState,
  units: UnitSystem,
): { input: ProductInput; errors: null } | { input: null; errors: FieldErrors } {
  const errors: FieldErrors = {};
  const length = (text: string, key: string, required: boolean): number | undefined => {
    if (!text.trim()) {
      if (required) errors[key] = 'Required';
      return undefined;
    }
    const mm = parseLength(text, units);
    if (mm === null) {
      errors[key] =
        units === 'metric'
          ? 'Enter a length, e.g. 3000 or 3 m'
          : 'Enter a length, e.g. 9\' 10" or 118"';
      return undefined;
    }
    return Math.round(mm * 10) / 10;
  };
  const number = (text: string, key: string, label: string): number | undefined => {
    if (!text.trim()) return undefined;
    const v = Number(text.replace(/,/g, ''));
    if (!Number.isFinite(v)) {
      errors[key] = `${label} must be a number`;
      return undefined;
    }
    return v;
  };

  const stockLengthsMm: number[] = [];
  s.stockLengths
    .split(/[,;]/)
    .map((t) => t.trim())
    .filter(Boolean)
    .forEach((t) => {
      const mm = parseLength(t, units);
      if (mm === null) errors.stockLengthsMm = `“${t}” is not a length`;
      else stockLengthsMm.push(Math.round(mm));
    });

  const dimensions: Record<string, unknown> = { ...s.extraDimensions };
  const width = length(s.width, 'dimensions.widthMm', false);
  const depth = length(s.depth, 'dimensions.depthMm', false);
  const len = length(s.length, 'dimensions.lengthMm', false);
  if (width !== undefined) dimensions.widthMm = width;
  if (depth !== undefined) dimensions.depthMm = depth;
  if (len !== undefined) dimensions.lengthMm = len;

  const spanTable = showsSpan(s.kind)
    ? s.spanRows
        .filter((r) => r.centres.trim() || r.span.trim() || r.cantilever.trim())
        .map((r, i) => ({
          centresMm: length(r.centres, `spanTable.${i}.centresMm`, true) ?? NaN,
          maxSpanMm: length(r.span, `spanTable.${i}.maxSpanMm`, true) ?? NaN,
          maxCantileverMm: r.cantilever.trim()
            ? (length(r.cantilever, `spanTable.${i}.maxCantileverMm`, true) ?? NaN)
            : 0,
        }))
    : [];

  let material: ProductInput['material'] = null;
  if (
    showsSpan(s.kind) &&
    (s.EMPa.trim() || s.fbMPa.trim() || s.fvMPa.trim() || s.densityKgM3.trim())
  ) {
    const E = number(s.EMPa, 'material.EMPa', 'E');
    const fb = number(s.fbMPa, 'material.fbMPa', 'Bending stress');
    const fv = number(s.fvMPa, 'material.fvMPa', 'Shear stress');
    const rho = number(s.densityKgM3, 'material.densityKgM3', 'Density');
    if (E === undefined && !errors['material.EMPa'])
      errors['material.EMPa'] = 'Required with material properties';
    if (fb === undefined && !errors['material.fbMPa'])
      errors['material.fbMPa'] = 'Required with material properties';
    if (fv === undefined && !errors['material.fvMPa'])
      errors['material.fvMPa'] = 'Required with material properties';
    material = {
      EMPa: E ?? NaN,
      fbMPa: fb ?? NaN,
      fvMPa: fv ?? NaN,
      ...(rho !== undefined ? { densityKgM3: rho } : {}),
    };
  }

  let boardMaxCentres: ProductInput['boardMaxCentres'] = null;
  if (showsBoard(s.kind) && (s.straightCentres.trim() || s.angledCentres.trim())) {
    boardMaxCentres = {
      straightMm: length(s.straightCentres, 'boardMaxCentres.straightMm', true) ?? NaN,
      angledMm: length(s.angledCentres, 'boardMaxCentres.angledMm', true) ?? NaN,
    };
  }

  const price = s.unitPrice.trim() === '' ? NaN : Number(s.unitPrice.replace(/[£$,\s]/g, ''));
  const input = {
    kind: s.kind,
    name: s.name,
    sku: s.sku,
    unit: s.unit,
    unitPrice: price,
    stockLengthsMm,
    dimensions,
    spanTable: spanTable.length ? spanTable : null,
    material,
    boardMaxCentres,
    active: s.active,
  } as ProductInput;

  const parsed = productInputSchema.safeParse(input);
  if (!parsed.success) {
    const schemaErrors = issuesToFieldErrors(parsed.error.issues);
    if (Number.isNaN(price)) schemaErrors.unitPrice = 'Enter a price, e.g. 24.50';
    // Our own parse messages are clearer than the schema's "must be a number" for the same field.
    return { input: null, errors: { ...schemaErrors, ...errors } };
  }
  if (Object.keys(errors).length) return { input: null, errors };
  return { input, errors: null };
}
