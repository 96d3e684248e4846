// The firm's product catalogue: list with search, read, create, change, delete. Reads for every role, writes for the owner.
import { Op, UniqueConstraintError, type WhereOptions } from 'sequelize';
import type { SessionUser } from '@/lib/validation/access';
import { idSchema } from '@/lib/validation/common';
import {
  productInputSchema,
  productListQuerySchema,
  productPatchSchema,
  type ProductDto,
  type ProductValues,
} from '@/lib/validation/product';
import { Product } from '@/models';
import { assertCan } from './access';
import { db } from './db';
import { BadRequest, NotFound, parseInput } from './errors';

/** Escapes LIKE wildcards so a search for "50%" means the text "50%". */
function likePattern(q: string): string {
  return `%${q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

/** JSON shape of a product (price as a number of pounds/dollars, two decimals). */
export function productDto(p: Product): ProductDto {
  return {
    id: p.id,
    kind: p.kind,
    name: p.name,
    sku: p.sku,
    unit: p.unit as ProductDto['unit'],
    unitPrice: Number(p.unitPrice),
    stockLengthsMm: [...(p.stockLengthsMm ?? [])],
    dimensions: (p.dimensions ?? {}) as ProductDto['dimensions'],
    spanTable: (p.spanTable ?? null) as ProductDto['spanTable'],
    material: (p.material ?? null) as ProductDto['material'],
    boardMaxCentres: (p.boardMaxCentres ?? null) as ProductDto['boardMaxCentres'],
    active: p.active,
    createdAt: p.createdAt.toISOString(),
    updatedAt: p.updatedAt.toISOString(),
  };
}

/** The firm's products matching the query, by kind then name. */
export async function listProducts(actor: SessionUser, query: unknown): Promise<ProductDto[]> {
  assertCan(actor, 'catalogue:read');
  const { q, kind, status } = parseInput(productListQuerySchema, query);
  db();
  const and: WhereOptions[] = [{ firmId: actor.firmId }];
  if (kind) and.push({ kind });
  if (status !== 'all') and.push({ active: status === 'active' });
  if (q) {
    const pattern = likePattern(q);
    and.push({ [Op.or]: [{ name: { [Op.iLike]: pattern } }, { sku: { [Op.iLike]: pattern } }] });
  }
  const rows = await Product.findAll({
    where: { [Op.and]: and },
    order: [
      ['kind', 'ASC'],
      ['name', 'ASC'],
      ['id', 'ASC'],
    ],
  });
  return rows.map(productDto);
}

async function findProduct(actor: SessionUser, id: string): Promise<Product> {
  if (!idSchema.safeParse(id).success) throw new NotFound('Product not found');
  db();
  const p = await Product.findOne({ where: { id, firmId: actor.firmId } });
  if (!p) throw new NotFound('Product not found');
  return p;
}

/** One product of the firm; another firm's (or a malformed) id is NotFound. */
export async function getProduct(actor: SessionUser, id: string): Promise<ProductDto> {
  assertCan(actor, 'catalogue:read');
  return productDto(await findProduct(actor, id));
}

function toRow(v: ProductValues) {
  return {
    kind: v.kind,
    name: v.name,
    sku: v.sku,
    unit: v.unit,
    unitPrice: v.unitPrice.toFixed(2),
    stockLengthsMm: [...v.stockLengthsMm].sort((a, b) => a - b),
    dimensions: v.dimensions,
    spanTable: v.spanTable && v.spanTable.length > 0 ? v.spanTable : null,
    material: v.material,
    boardMaxCentres: v.boardMaxCentres,
    active: v.active,
  };
}

/** A duplicate SKU is the owner's input to fix, so it is a 400 on the SKU field. */
async function savingSku<T>(sku: string, fn: () => Promise<T>): Promise<T> {
  try {
    return await fn();
  } catch (err) {
    if (err instanceof UniqueConstraintError) {
      const msg = `Another product already has the SKU “${sku}”`;
      throw new BadRequest(msg, { sku: [msg] });
    }
    throw err;
  }
}

/** Adds a product to the firm's catalogue (owner only). */
export async function createProduct(actor: SessionUser, input: unknown): Promise<ProductDto> {
  assertCan(actor, 'catalogue:write');
  const values = parseInput(productInputSchema, input);
  db();
  const p = await savingSku(values.sku, () =>
    Product.create({ ...toRow(values), firmId: actor.firmId }),
  );
  return productDto(p);
}

/** Changes some fields of a product (owner only); the result is checked as a whole product. */
export async function updateProduct(
  actor: SessionUser,
  id: string,
  input: unknown,
): Promise<ProductDto> {
  assertCan(actor, 'catalogue:write');
  const patch = parseInput(productPatchSchema, input);
  const p = await findProduct(actor, id);
  const current = productDto(p);
  const merged = parseInput(productInputSchema, {
    kind: current.kind,
    name: current.name,
    sku: current.sku,
    unit: current.unit,
    unitPrice: current.unitPrice,
    stockLengthsMm: current.stockLengthsMm,
    dimensions: current.dimensions,
    spanTable: current.spanTable,
    material: current.material,
    boardMaxCentres: current.boardMaxCentres,
    active: current.active,
    ...patch,
  });
  await savingSku(merged.sku, () => p.update(toRow(merged)));
  return productDto(p);
}

/** Removes a product (owner only). Designs that chose it show their lines as unpriced. */
export async function deleteProduct(actor: SessionUser, id: string): Promise<void> {
  assertCan(actor, 'catalogue:write');
  const p = await findProduct(actor, id);
  await p.destroy();
}
