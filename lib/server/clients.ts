// Clients of the signed-in user's firm.
import { fn, col, type Transaction } from 'sequelize';
import type { SessionUser } from '@/lib/validation/access';
import { clientCreateSchema, type ClientCreate, type ClientDto } from '@/lib/validation/client';
import { idSchema } from '@/lib/validation/common';
import { Client } from '@/models';
import { assertCan } from './access';
import { db } from './db';
import { NotFound, parseInput } from './errors';

/** JSON shape of a client. */
export function clientDto(c: Client): ClientDto {
  return {
    id: c.id,
    name: c.name,
    email: c.email ?? null,
    phone: c.phone ?? null,
    address: c.address ?? null,
    createdAt: c.createdAt.toISOString(),
    updatedAt: c.updatedAt.toISOString(),
  };
}

/** Every client of the firm, A to Z. */
export async function listClients(actor: SessionUser): Promise<ClientDto[]> {
  assertCan(actor, 'client:read');
  db();
  const clients = await Client.findAll({
    where: { firmId: actor.firmId },
    // A to Z regardless of capitals (the database collation is byte order).
    order: [
      [fn('lower', col('name')), 'ASC'],
      ['id', 'ASC'],
    ],
  });
  return clients.map(clientDto);
}

/** Inserts an already-validated client (used by createClient and by job creation). */
export async function insertClient(
  actor: SessionUser,
  data: ClientCreate,
  transaction?: Transaction,
): Promise<Client> {
  db();
  return Client.create({ ...data, firmId: actor.firmId }, { transaction });
}

export async function createClient(actor: SessionUser, input: unknown): Promise<ClientDto> {
  assertCan(actor, 'client:write');
  const data = parseInput(clientCreateSchema, input);
  return clientDto(await insertClient(actor, data));
}

/** One client of the firm; another firm's (or a malformed) id is NotFound. */
export async function getClient(actor: SessionUser, id: string): Promise<ClientDto> {
  assertCan(actor, 'client:read');
  if (!idSchema.safeParse(id).success) throw new NotFound('Client not found');
  db();
  const client = await Client.findOne({ where: { id, firmId: actor.firmId } });
  if (!client) throw new NotFound('Client not found');
  return clientDto(client);
}
