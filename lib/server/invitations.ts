// Team invitations: the owner invites a designer or crew member by e-mail; the link (a random
// single-use token, only its hash stored) lets them set a password and join the firm.
import bcrypt from 'bcryptjs';
import type { SessionUser } from '@/lib/validation/access';
import { acceptInviteSchema, inviteSchema } from '@/lib/validation/invitation';
import { assertCanDo } from './businessAccess';
import { bdb } from './businessDb';
import { Conflict, HttpError, NotFound, parseInput } from './errors';
import { queueMail } from './mail';
import { serviceConfig } from './serviceConfig';
import { hashToken, randomToken } from './signedToken';

const INVITE_DAYS = 7;

export interface InvitationView {
  id: string;
  email: string;
  name: string;
  role: 'designer' | 'crew';
  expiresAt: string;
  acceptedAt: string | null;
}

export async function inviteMember(
  actor: SessionUser,
  input: unknown,
): Promise<InvitationView & { emailStatus: string; link: string }> {
  assertCanDo(actor, 'team:invite');
  const body = parseInput(inviteSchema, input);
  const { models } = bdb();
  const taken = await models.User.count({ where: { email: body.email } });
  if (taken) throw new Conflict('Someone already has an account with that e-mail address');
  const { token, hash } = randomToken();
  const inv = await models.Invitation.create({
    firmId: actor.firmId,
    email: body.email,
    name: body.name,
    role: body.role,
    tokenHash: hash,
    invitedById: actor.id,
    expiresAt: new Date(Date.now() + INVITE_DAYS * 86_400_000),
  });
  const firm = await models.Firm.findByPk(actor.firmId);
  const link = `${serviceConfig().appUrl}/invite/${token}`;
  const mail = await queueMail({
    firmId: actor.firmId,
    kind: 'invitation',
    to: body.email,
    subject: `${actor.name} invites you to ${firm?.name ?? 'their firm'} on Joistwright`,
    text: [
      `Hello ${body.name},`,
      '',
      `${actor.name} has invited you to join ${firm?.name ?? 'their firm'} on Joistwright as ${body.role === 'crew' ? 'crew' : 'a designer'}.`,
      '',
      `Set your password here (the link works once, for ${INVITE_DAYS} days):`,
      link,
    ].join('\n'),
    createdById: actor.id,
  });
  return { ...view(inv), emailStatus: mail.status, link };
}

function view(i: {
  id: string;
  email: string;
  name: string;
  role: 'designer' | 'crew';
  expiresAt: Date;
  acceptedAt?: Date | null;
}): InvitationView {
  return {
    id: i.id,
    email: i.email,
    name: i.name,
    role: i.role,
    expiresAt: i.expiresAt.toISOString(),
    acceptedAt: i.acceptedAt ? i.acceptedAt.toISOString() : null,
  };
}

export async function listInvitations(actor: SessionUser): Promise<InvitationView[]> {
  assertCanDo(actor, 'team:invite');
  const { models } = bdb();
  const rows = await models.Invitation.findAll({
    where: { firmId: actor.firmId, revokedAt: null },
    order: [['createdAt', 'DESC']],
    limit: 100,
  });
  return rows.map(view);
}

export type InvitationLookup =
  | { state: 'ok'; firmName: string; name: string; email: string; role: string }
  | { state: 'invalid' | 'expired' | 'used' };

export async function loadInvitation(token: string): Promise<InvitationLookup> {
  if (!/^[A-Za-z0-9_-]{43}$/.test(token)) return { state: 'invalid' };
  const { models } = bdb();
  const inv = await models.Invitation.findOne({ where: { tokenHash: hashToken(token) } });
  if (!inv || inv.revokedAt) return { state: 'invalid' };
  if (inv.acceptedAt) return { state: 'used' };
  if (inv.expiresAt.getTime() < Date.now()) return { state: 'expired' };
  const firm = await models.Firm.findByPk(inv.firmId);
  return {
    state: 'ok',
    firmName: firm?.name ?? '',
    name: inv.name,
    email: inv.email,
    role: inv.role,
  };
}

/** Creates the account from the invitation (once) and returns the e-mail to sign in with. */
export async function acceptInvitation(token: string, input: unknown): Promise<{ email: string }> {
  const body = parseInput(acceptInviteSchema, input);
  if (!/^[A-Za-z0-9_-]{43}$/.test(token)) throw new NotFound('This invitation link is not valid');
  const { models, sequelize } = bdb();
  const passwordHash = await bcrypt.hash(body.password, 10);
  return sequelize.transaction(async (transaction) => {
    const inv = await models.Invitation.findOne({
      where: { tokenHash: hashToken(token) },
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    if (!inv || inv.revokedAt) throw new NotFound('This invitation link is not valid');
    if (inv.acceptedAt)
      throw new Conflict('This invitation has already been used; sign in instead');
    if (inv.expiresAt.getTime() < Date.now())
      throw new HttpError(410, 'This invitation has expired; ask for a new one');
    const user = await models.User.create(
      {
        firmId: inv.firmId,
        name: body.name ?? inv.name,
        email: inv.email,
        role: inv.role,
        passwordHash,
      },
      { transaction },
    );
    await inv.update({ acceptedAt: new Date(), acceptedUserId: user.id }, { transaction });
    return { email: inv.email };
  });
}
