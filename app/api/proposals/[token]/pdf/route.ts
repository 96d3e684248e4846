// GET /api/proposals/[token]/pdf: the client's copy of their quote.
import { quotePdf } from '@/lib/pdf/quotePdf';
import { handle, HttpError } from '@/lib/server/errors';
import { loadProposal } from '@/lib/server/proposals';
import { quotePdfInput, toView } from '@/lib/server/quotes';
import { bdb } from '@/lib/server/businessDb';

type Ctx = { params: Promise<{ token: string }> };

export const GET = handle(async (_req, { params }: Ctx) => {
  const { token } = await params;
  const found = await loadProposal(token);
  if (found.state !== 'ok')
    throw new HttpError(found.state === 'expired' ? 410 : 404, 'This proposal link is not valid');
  const q = (await bdb().models.Quote.findByPk(found.quoteId))!;
  const bytes = await quotePdf(await quotePdfInput(await toView(q), q.firmId));
  return new Response(Buffer.from(bytes), {
    headers: {
      'content-type': 'application/pdf',
      'content-disposition': `inline; filename="${found.view.reference}.pdf"`,
      'cache-control': 'private, no-store',
    },
  });
});
