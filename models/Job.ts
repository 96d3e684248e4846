// A job: one deck for one client, from first enquiry to a finished build (or lost).
import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { Client } from './Client';
import { JOB_STATUSES, type JobStatus } from './constants';
import type { Design } from './Design';
import type { Firm } from './Firm';
import type { User } from './User';

export class Job extends Model<InferAttributes<Job>, InferCreationAttributes<Job>> {
  declare id: CreationOptional<string>;
  declare firmId: ForeignKey<Firm['id']>;
  declare clientId: ForeignKey<Client['id']> | null;
  declare title: string;
  declare siteAddress: CreationOptional<string>;
  declare status: CreationOptional<JobStatus>;
  declare notes: CreationOptional<string>;
  declare createdById: ForeignKey<User['id']> | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare client?: NonAttribute<Client | null>;
  declare designs?: NonAttribute<Design[]>;
}

export function initJob(sequelize: Sequelize): typeof Job {
  Job.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      title: { type: DataTypes.TEXT, allowNull: false },
      siteAddress: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
      status: {
        type: DataTypes.TEXT,
        allowNull: false,
        defaultValue: 'enquiry',
        validate: { isIn: [JOB_STATUSES] },
      },
      notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'jobs', modelName: 'Job', underscored: true },
  );
  return Job;
}
