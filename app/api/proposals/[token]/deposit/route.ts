// POST /api/proposals/[token]/deposit: opens the payment page for the deposit of an accepted
// quote. A form post is redirected there (or back to the proposal, which explains, when it cannot
// be paid); a JSON call gets { url } or the error.
import { handle } from '@/lib/server/errors';
import { startDeposit } from '@/lib/server/proposals';

type Ctx = { params: Promise<{ token: string }> };

export const POST = handle(async (req, { params }: Ctx) => {
  const { token } = await params;
  const wantsJson = (req.headers.get('content-type') ?? '').includes('application/json');
  if (wantsJson) return Response.json(await startDeposit(token));
  try {
    const { url } = await startDeposit(token);
    return new Response(null, { status: 303, headers: { location: url } });
  } catch {
    return new Response(null, {
      status: 303,
      headers: { location: `/p/${encodeURIComponent(token)}` },
    });
  }
});
