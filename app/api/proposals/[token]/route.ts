// The client's proposal (no account; the signed link is the only key): GET what they may see,
// POST their answer { answer: "accept", name, agree: true } or { answer: "decline", reason? }.
import { handle, HttpError, readJson } from '@/lib/server/errors';
import { answerProposal, loadProposal } from '@/lib/server/proposals';

type Ctx = { params: Promise<{ token: string }> };

export const GET = handle(async (_req, { params }: Ctx) => {
  const { token } = await params;
  const found = await loadProposal(token);
  if (found.state === 'expired') throw new HttpError(410, 'This proposal link has expired');
  if (found.state !== 'ok') throw new HttpError(404, 'This proposal link is not valid');
  return Response.json(found.view, { headers: { 'cache-control': 'no-store' } });
});

export const POST = handle(async (req, { params }: Ctx) => {
  const { token } = await params;
  return Response.json(await answerProposal(token, await readJson(req)));
});
