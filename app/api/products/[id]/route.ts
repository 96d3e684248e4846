// GET, PATCH and DELETE /api/products/[id]; writes are the owner's.
import { requireUser } from '@/lib/auth';
import { handle, readJson } from '@/lib/server/errors';
import { deleteProduct, getProduct, updateProduct } from '@/lib/server/products';

type Ctx = { params: Promise<{ id: string }> };

export const GET = handle(async (req, { params }: Ctx) => {
  const user = await requireUser(req);
  const { id } = await params;
  return Response.json(await getProduct(user, id));
});

export const PATCH = handle(async (req, { params }: Ctx) => {
  const user = await requireUser(req);
  const { id } = await params;
  return Response.json(await updateProduct(user, id, await readJson(req)));
});

export const DELETE = handle(async (req, { params }: Ctx) => {
  const user = await requireUser(req);
  const { id } = await params;
  await deleteProduct(user, id);
  return new Response(null, { status: 204 });
});
