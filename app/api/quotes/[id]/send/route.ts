// POST /api/quotes/[id]/send: e-mails the client their proposal link and the quote PDF.
import { requireUser } from '@/lib/auth';
import { handle, readJson } from '@/lib/server/errors';
import { sendQuote } from '@/lib/server/quotes';

type Ctx = { params: Promise<{ id: string }> };

export const POST = handle(async (req, { params }: Ctx) => {
  const user = await requireUser(req);
  const { id } = await params;
  return Response.json(await sendQuote(user, id, await readJson(req)));
});
