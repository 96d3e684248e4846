// GET /api/products (q, kind, status) and POST /api/products (owner adds a product).
import { requireUser } from '@/lib/auth';
import { handle, readJson } from '@/lib/server/errors';
import { createProduct, listProducts } from '@/lib/server/products';

export const GET = handle(async (req) => {
  const user = await requireUser(req);
  const query = Object.fromEntries(new URL(req.url).searchParams);
  return Response.json(await listProducts(user, query));
});

export const POST = handle(async (req) => {
  const user = await requireUser(req);
  return Response.json(await createProduct(user, await readJson(req)), { status: 201 });
});
