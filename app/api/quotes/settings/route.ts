// GET (owner, designer) and PUT (owner) the firm's quoting defaults.
import { requireUser } from '@/lib/auth';
import { assertCanDo } from '@/lib/server/businessAccess';
import { handle, readJson } from '@/lib/server/errors';
import { getQuoteSettings, updateQuoteSettings } from '@/lib/server/quotes';

export const GET = handle(async (req) => {
  const user = await requireUser(req);
  assertCanDo(user, 'quote:read');
  return Response.json(await getQuoteSettings(user.firmId));
});

export const PUT = handle(async (req) => {
  const user = await requireUser(req);
  return Response.json(await updateQuoteSettings(user, await readJson(req)));
});
