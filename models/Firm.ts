// The firm: the tenant every other record belongs to.
import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

export class Firm extends Model<InferAttributes<Firm>, InferCreationAttributes<Firm>> {
  declare id: CreationOptional<string>;
  declare name: string;
  declare address: CreationOptional<string>;
  declare town: CreationOptional<string>;
  declare postcode: CreationOptional<string>;
  declare phone: CreationOptional<string | null>;
  declare email: CreationOptional<string | null>;
  declare currency: CreationOptional<string>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initFirm(sequelize: Sequelize): typeof Firm {
  Firm.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      name: { type: DataTypes.TEXT, allowNull: false },
      address: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
      town: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
      postcode: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
      phone: { type: DataTypes.TEXT, allowNull: true },
      email: { type: DataTypes.TEXT, allowNull: true },
      currency: { type: DataTypes.CHAR(3), allowNull: false, defaultValue: 'GBP' },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'firms', modelName: 'Firm', underscored: true },
  );
  return Firm;
}
