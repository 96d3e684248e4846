// POST /api/proposals/[token]/deposit: opens the payment page for the deposit of an accepted
// quote. A form post is redirected there; a JSON call gets { url }.
import { handle } from '@/lib/server/errors';
import { startDeposit } from '@/lib/server/proposals';

type Ctx = { params: Promise<{ token: string }> };

export const POST = handle(async (req, { params }: Ctx) => {
  const { token } = await params;
  const { url } = await startDeposit(token);
  if ((req.headers.get('content-type') ?? '').includes('application/json'))
    return Response.json({ url });
  return new Response(null, { status: 303, headers: { location: url } });
});
