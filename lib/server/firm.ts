// The signed-in user's firm and its team.
import type { SessionUser } from '@/lib/validation/access';
import type { FirmDto } from '@/lib/validation/firm';
import { Firm, User } from '@/models';
import { assertCan } from './access';
import { db } from './db';
import { NotFound } from './errors';

/** The firm's details and its active users (no password hashes). */
export async function getFirm(actor: SessionUser): Promise<FirmDto> {
  assertCan(actor, 'firm:read');
  db();
  const firm = await Firm.findByPk(actor.firmId);
  if (!firm) throw new NotFound('Firm not found');
  const users = await User.findAll({
    where: { firmId: actor.firmId, active: true },
    order: [['name', 'ASC']],
  });
  return {
    firm: {
      id: firm.id,
      name: firm.name,
      address: firm.address,
      town: firm.town,
      postcode: firm.postcode,
      phone: firm.phone ?? null,
      email: firm.email ?? null,
      currency: firm.currency,
    },
    users: users.map((u) => ({ id: u.id, name: u.name, email: u.email, role: u.role })),
  };
}
