// Catalogue product schemas: the product itself (from the engine, shared by form, API and engine), list query and API shape.
import { z } from 'zod';
import {
  PRODUCT_KINDS,
  productInputSchema,
  productPatchSchema,
  type CatalogueProduct,
} from '@/engine/products/schema';

export {
  PRODUCT_KINDS,
  PRODUCT_UNITS,
  productInputSchema,
  productPatchSchema,
  spanTableRowSchema,
  materialSchema,
  boardMaxCentresSchema,
  type ProductKind,
  type ProductInput,
  type ProductValues,
  type ProductPatch,
  type SpanTableRow,
  type ProductMaterial,
  type BoardMaxCentres,
  type CatalogueProduct,
} from '@/engine/products/schema';

/** GET /api/products query: free text over name and SKU, a kind, and active/retired/all. */
export const productListQuerySchema = z.object({
  q: z.string().trim().max(100, 'Search must be at most 100 characters').default(''),
  kind: z.enum(PRODUCT_KINDS, { error: 'Unknown product kind' }).optional(),
  status: z.enum(['active', 'retired', 'all']).default('all'),
});
export type ProductListQuery = z.output<typeof productListQuerySchema>;

/** A product as the API answers it. */
export type ProductDto = CatalogueProduct & { createdAt: string; updatedAt: string };

export { productInputSchema as productCreateSchema, productPatchSchema as productUpdateSchema };
