// GET the firm's invitations; POST { email, name, role } invites a designer or crew member (owner).
import { requireUser } from '@/lib/auth';
import { handle, readJson } from '@/lib/server/errors';
import { inviteMember, listInvitations } from '@/lib/server/invitations';

export const GET = handle(async (req) => {
  const user = await requireUser(req);
  return Response.json(await listInvitations(user));
});

export const POST = handle(async (req) => {
  const user = await requireUser(req);
  return Response.json(await inviteMember(user, await readJson(req)), { status: 201 });
});
