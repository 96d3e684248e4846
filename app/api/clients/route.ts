// GET /api/clients (all roles) and POST /api/clients (owner, designer).
import { requireUser } from '@/lib/auth';
import { createClient, listClients } from '@/lib/server/clients';
import { handle, readJson } from '@/lib/server/errors';

export const GET = handle(async (req) => {
  const user = await requireUser(req);
  return Response.json(await listClients(user));
});

export const POST = handle(async (req) => {
  const user = await requireUser(req);
  return Response.json(await createClient(user, await readJson(req)), { status: 201 });
});
