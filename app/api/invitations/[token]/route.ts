// POST { password, confirm, name? } to /api/invitations/[token]: the invited person sets their
// password and the account is created (public: the single-use link is the key).
import { handle, readJson } from '@/lib/server/errors';
import { acceptInvitation } from '@/lib/server/invitations';

type Ctx = { params: Promise<{ token: string }> };

export const POST = handle(async (req, { params }: Ctx) => {
  const { token } = await params;
  return Response.json(await acceptInvitation(token, await readJson(req)), { status: 201 });
});
