// Registers every model on one Sequelize instance and wires the associations. Only lib/server/ calls it.
import type { Sequelize } from 'sequelize';
import { Client, initClient } from './Client';
import { Design, initDesign } from './Design';
import { DesignRevision, initDesignRevision } from './DesignRevision';
import { Firm, initFirm } from './Firm';
import { Job, initJob } from './Job';
import { Product, initProduct } from './Product';
import { User, initUser } from './User';

export { Client, Design, DesignRevision, Firm, Job, Product, User };
export * from './constants';

export function initModels(sequelize: Sequelize) {
  initFirm(sequelize);
  initUser(sequelize);
  initClient(sequelize);
  initJob(sequelize);
  initDesign(sequelize);
  initDesignRevision(sequelize);
  initProduct(sequelize);

  // Constraints live in the migrations; these only teach Sequelize the joins.
  const fk = (name: string) => ({ name, allowNull: false });
  Firm.hasMany(User, { foreignKey: fk('firmId'), as: 'users' });
  User.belongsTo(Firm, { foreignKey: fk('firmId'), as: 'firm' });
  Firm.hasMany(Client, { foreignKey: fk('firmId'), as: 'clients' });
  Firm.hasMany(Job, { foreignKey: fk('firmId'), as: 'jobs' });
  Firm.hasMany(Product, { foreignKey: fk('firmId'), as: 'products' });

  Client.hasMany(Job, { foreignKey: { name: 'clientId', allowNull: true }, as: 'jobs' });
  Job.belongsTo(Client, { foreignKey: { name: 'clientId', allowNull: true }, as: 'client' });
  Job.belongsTo(User, { foreignKey: { name: 'createdById', allowNull: true }, as: 'createdBy' });
  Job.hasMany(Design, { foreignKey: fk('jobId'), as: 'designs' });

  Design.belongsTo(Job, { foreignKey: fk('jobId'), as: 'job' });
  Design.belongsTo(User, { foreignKey: { name: 'updatedById', allowNull: true }, as: 'updatedBy' });
  Design.hasMany(DesignRevision, { foreignKey: fk('designId'), as: 'revisions' });
  DesignRevision.belongsTo(Design, { foreignKey: fk('designId'), as: 'design' });
  DesignRevision.belongsTo(User, {
    foreignKey: { name: 'savedById', allowNull: true },
    as: 'savedBy',
  });

  // firmId on tables whose parent association is elsewhere still needs its attribute.
  Design.belongsTo(Firm, { foreignKey: fk('firmId'), as: 'firm' });
  DesignRevision.belongsTo(Firm, { foreignKey: fk('firmId'), as: 'firm' });
  return { Firm, User, Client, Job, Design, DesignRevision, Product };
}
