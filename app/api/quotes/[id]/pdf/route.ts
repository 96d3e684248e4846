// GET /api/quotes/[id]/pdf: the quote as the client receives it.
import { requireUser } from '@/lib/auth';
import { quotePdf } from '@/lib/pdf/quotePdf';
import { handle } from '@/lib/server/errors';
import { getQuote, quotePdfInput } from '@/lib/server/quotes';

type Ctx = { params: Promise<{ id: string }> };

export const GET = handle(async (req, { params }: Ctx) => {
  const user = await requireUser(req);
  const { id } = await params;
  const quote = await getQuote(user, id);
  const bytes = await quotePdf(await quotePdfInput(quote, user.firmId));
  return new Response(Buffer.from(bytes), {
    headers: {
      'content-type': 'application/pdf',
      'content-disposition': `inline; filename="${quote.reference}.pdf"`,
      'cache-control': 'private, no-store',
    },
  });
});
