// A deck design: the design document (engine/schema.ts) plus a version for optimistic concurrency.
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
import type { DesignDocument } from '@/engine/schema';
import type { Firm } from './Firm';
import type { Job } from './Job';
import type { User } from './User';

export class Design extends Model<InferAttributes<Design>, InferCreationAttributes<Design>> {
  declare id: CreationOptional<string>;
  declare firmId: ForeignKey<Firm['id']>;
  declare jobId: ForeignKey<Job['id']>;
  declare name: string;
  declare document: DesignDocument;
  /** Bumped by one on every save; a save naming an older version is refused (409). */
  declare version: CreationOptional<number>;
  declare updatedById: ForeignKey<User['id']> | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare updatedBy?: NonAttribute<User | null>;
  declare job?: NonAttribute<Job>;
}

export function initDesign(sequelize: Sequelize): typeof Design {
  Design.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      name: { type: DataTypes.TEXT, allowNull: false },
      document: { type: DataTypes.JSONB, allowNull: false },
      version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'designs', modelName: 'Design', underscored: true },
  );
  return Design;
}
