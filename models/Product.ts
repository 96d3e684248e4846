// A catalogue product with its price and the structural data the engine's checks read.
import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import { PRODUCT_KINDS, type ProductKind } from './constants';
import type { Firm } from './Firm';

/** Sizes in mm; extra keys (lengthMm, diameterMm, clip, border) depend on the kind. */
export interface ProductDimensions {
  widthMm?: number;
  depthMm?: number;
  lengthMm?: number;
  [key: string]: unknown;
}

/** One row of a maker's span table: at these centres the joist may span this far. */
export interface SpanTableRow {
  centresMm: number;
  maxSpanMm: number;
  maxCantileverMm: number;
}

/** Material properties for an engineered span check (AWC Design Aid No. 6 formulas). */
export interface ProductMaterial {
  EMPa: number;
  fbMPa: number;
  fvMPa: number;
  /** Optional: self-weight is added to the dead load only when a density is given. */
  densityKgM3?: number;
}

/** Largest joist centres a board may span, laid square to the joists and at an angle. */
export interface BoardMaxCentres {
  straightMm: number;
  angledMm: number;
}

export class Product extends Model<InferAttributes<Product>, InferCreationAttributes<Product>> {
  declare id: CreationOptional<string>;
  declare firmId: ForeignKey<Firm['id']>;
  declare kind: ProductKind;
  declare name: string;
  declare sku: string;
  declare unit: CreationOptional<string>;
  /** NUMERIC(12,2): pg returns it as a string to keep pennies exact. */
  declare unitPrice: CreationOptional<string>;
  declare stockLengthsMm: CreationOptional<number[]>;
  declare dimensions: CreationOptional<ProductDimensions>;
  declare spanTable: CreationOptional<SpanTableRow[] | null>;
  declare material: CreationOptional<ProductMaterial | null>;
  declare boardMaxCentres: CreationOptional<BoardMaxCentres | null>;
  declare active: CreationOptional<boolean>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initProduct(sequelize: Sequelize): typeof Product {
  Product.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      kind: { type: DataTypes.TEXT, allowNull: false, validate: { isIn: [PRODUCT_KINDS] } },
      name: { type: DataTypes.TEXT, allowNull: false },
      sku: { type: DataTypes.TEXT, allowNull: false },
      unit: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'each' },
      unitPrice: { type: DataTypes.DECIMAL(12, 2), allowNull: false, defaultValue: '0' },
      stockLengthsMm: {
        type: DataTypes.ARRAY(DataTypes.INTEGER),
        allowNull: false,
        defaultValue: [],
      },
      dimensions: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
      spanTable: { type: DataTypes.JSONB, allowNull: true },
      material: { type: DataTypes.JSONB, allowNull: true },
      boardMaxCentres: { type: DataTypes.JSONB, allowNull: true },
      active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'products', modelName: 'Product', underscored: true },
  );
  return Product;
}
