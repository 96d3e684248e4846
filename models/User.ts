// A person who signs in: owner, designer or crew of exactly one firm.
import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import { ROLES, UNIT_SYSTEMS, type Role, type Units } from './constants';
import type { Firm } from './Firm';

export class User extends Model<InferAttributes<User>, InferCreationAttributes<User>> {
  declare id: CreationOptional<string>;
  declare firmId: ForeignKey<Firm['id']>;
  declare name: string;
  /** Always stored lower-case; unique across all firms (sign-in finds the user by email alone). */
  declare email: string;
  declare role: Role;
  declare passwordHash: string;
  declare units: CreationOptional<Units>;
  declare active: CreationOptional<boolean>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initUser(sequelize: Sequelize): typeof User {
  User.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      name: { type: DataTypes.TEXT, allowNull: false },
      email: {
        type: DataTypes.TEXT,
        allowNull: false,
        set(value: string) {
          this.setDataValue('email', String(value).trim().toLowerCase());
        },
      },
      role: { type: DataTypes.TEXT, allowNull: false, validate: { isIn: [ROLES] } },
      passwordHash: { type: DataTypes.TEXT, allowNull: false },
      units: {
        type: DataTypes.TEXT,
        allowNull: false,
        defaultValue: 'metric',
        validate: { isIn: [UNIT_SYSTEMS] },
      },
      active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    {
      sequelize,
      tableName: 'users',
      modelName: 'User',
      underscored: true,
      // WARNING: never send the hash to a browser; services pick the fields they return.
      defaultScope: { attributes: { exclude: ['passwordHash'] } },
      scopes: { withPassword: { attributes: { include: ['passwordHash'] } } },
    },
  );
  return User;
}
