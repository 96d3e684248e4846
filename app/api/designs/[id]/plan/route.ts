// GET /api/designs/[id]/plan?paper=a4|a3: the crew's framing plan as a PDF download (every role of the firm).
import { requireUser } from '@/lib/auth';
import { framingPlanPdf } from '@/lib/pdf/framingPlan';
import { planQuerySchema, queryObject } from '@/lib/pdf/requests';
import { handle, parseInput } from '@/lib/server/errors';
import { fileSlug, loadDesignForCrew } from '@/lib/server/framing';

type Ctx = { params: Promise<{ id: string }> };

export const GET = handle(async (req, { params }: Ctx) => {
  const user = await requireUser(req);
  const { paper } = parseInput(planQuerySchema, queryObject(new URL(req.url).searchParams));
  const { id } = await params;
  const loaded = await loadDesignForCrew(user, id);
  const bytes = framingPlanPdf({
    plan: loaded.plan,
    design: loaded.design,
    meta: loaded.meta,
    paper,
  });
  const name = `framing-plan-${fileSlug(loaded.jobTitle)}-v${loaded.version}-${paper}.pdf`;
  return new Response(Buffer.from(bytes), {
    headers: {
      'Content-Type': 'application/pdf',
      'Content-Disposition': `attachment; filename="${name}"`,
      'Cache-Control': 'private, no-store',
    },
  });
});
