// GET /api/designs/[id]/materials?wastePct=10[&format=csv]: the priced take-off as JSON or a CSV download.
import { materialsCsv } from '@/engine/takeoff/csv';
import { requireUser } from '@/lib/auth';
import { materialsQuerySchema, queryObject } from '@/lib/pdf/requests';
import { handle, parseInput } from '@/lib/server/errors';
import { fileSlug, loadDesignForCrew, pricedMaterials } from '@/lib/server/framing';

type Ctx = { params: Promise<{ id: string }> };

export const GET = handle(async (req, { params }: Ctx) => {
  const user = await requireUser(req);
  const query = parseInput(materialsQuerySchema, queryObject(new URL(req.url).searchParams));
  const { id } = await params;
  const loaded = await loadDesignForCrew(user, id);
  const priced = await pricedMaterials(user, loaded, query.wastePct);
  if (query.format === 'csv') {
    const name = `materials-${fileSlug(loaded.jobTitle)}-v${loaded.version}.csv`;
    return new Response(materialsCsv(priced), {
      headers: {
        'Content-Type': 'text/csv; charset=utf-8',
        'Content-Disposition': `attachment; filename="${name}"`,
        'Cache-Control': 'private, no-store',
      },
    });
  }
  return Response.json({ designId: loaded.designId, version: loaded.version, ...priced });
});
