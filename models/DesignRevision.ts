// One saved version of a design: written in the same transaction as the save, never changed.
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
import type { Design } from './Design';
import type { Firm } from './Firm';
import type { User } from './User';

export class DesignRevision extends Model<
  InferAttributes<DesignRevision>,
  InferCreationAttributes<DesignRevision>
> {
  declare id: CreationOptional<string>;
  declare designId: ForeignKey<Design['id']>;
  declare firmId: ForeignKey<Firm['id']>;
  declare version: number;
  declare document: DesignDocument;
  declare savedById: ForeignKey<User['id']> | null;
  declare savedAt: CreationOptional<Date>;

  declare savedBy?: NonAttribute<User | null>;
}

export function initDesignRevision(sequelize: Sequelize): typeof DesignRevision {
  DesignRevision.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      version: { type: DataTypes.INTEGER, allowNull: false },
      document: { type: DataTypes.JSONB, allowNull: false },
      savedAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
    },
    {
      sequelize,
      tableName: 'design_revisions',
      modelName: 'DesignRevision',
      underscored: true,
      timestamps: false,
    },
  );
  return DesignRevision;
}
