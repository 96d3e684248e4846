// The foundation's connection plus the business models, registered once per Sequelize instance.
import type { Sequelize } from 'sequelize';
import { initBusinessModels } from '@/models/business';
import { db } from './db';

const registered = new WeakMap<Sequelize, ReturnType<typeof initBusinessModels>>();

/** db() with the quote, payment, mail, invitation, file and stage models added. */
export function bdb() {
  const base = db();
  let business = registered.get(base.sequelize);
  if (!business) {
    business = initBusinessModels(base.sequelize);
    registered.set(base.sequelize, business);
  }
  return { sequelize: base.sequelize, models: { ...base.models, ...business } };
}
