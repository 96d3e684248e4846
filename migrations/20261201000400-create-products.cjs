'use strict';
// The firm's catalogue: joists, boards, posts, blocks, fixings and the rest, with prices and the
// structural data the engine's checks read (span table, material properties, board centres).

/** @type {import('sequelize-cli').Migration} */
module.exports = {
  async up(queryInterface, Sequelize) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.createTable(
        'products',
        {
          id: {
            type: Sequelize.UUID,
            primaryKey: true,
            allowNull: false,
            defaultValue: Sequelize.literal('gen_random_uuid()'),
          },
          firm_id: {
            type: Sequelize.UUID,
            allowNull: false,
            references: { model: 'firms', key: 'id' },
            onDelete: 'CASCADE',
            onUpdate: 'CASCADE',
          },
          kind: { type: Sequelize.TEXT, allowNull: false },
          name: { type: Sequelize.TEXT, allowNull: false },
          sku: { type: Sequelize.TEXT, allowNull: false },
          unit: { type: Sequelize.TEXT, allowNull: false, defaultValue: 'each' },
          unit_price: { type: Sequelize.DECIMAL(12, 2), allowNull: false, defaultValue: 0 },
          stock_lengths_mm: {
            type: Sequelize.ARRAY(Sequelize.INTEGER),
            allowNull: false,
            defaultValue: [],
          },
          dimensions: { type: Sequelize.JSONB, allowNull: false, defaultValue: {} },
          span_table: { type: Sequelize.JSONB, allowNull: true },
          material: { type: Sequelize.JSONB, allowNull: true },
          board_max_centres: { type: Sequelize.JSONB, allowNull: true },
          active: { type: Sequelize.BOOLEAN, allowNull: false, defaultValue: true },
          created_at: { type: Sequelize.DATE, allowNull: false, defaultValue: Sequelize.fn('now') },
          updated_at: { type: Sequelize.DATE, allowNull: false, defaultValue: Sequelize.fn('now') },
        },
        { transaction },
      );
      await queryInterface.sequelize.query(
        `ALTER TABLE products
           ADD CONSTRAINT products_kind_check CHECK (kind IN ('joist', 'beam', 'board', 'post',
             'block', 'clip', 'screw', 'membrane', 'fascia', 'concrete', 'other')),
           ADD CONSTRAINT products_name_not_blank CHECK (length(btrim(name)) > 0),
           ADD CONSTRAINT products_sku_not_blank CHECK (length(btrim(sku)) > 0),
           ADD CONSTRAINT products_unit_price_non_negative CHECK (unit_price >= 0),
           ADD CONSTRAINT products_stock_lengths_positive CHECK (0 < ALL (stock_lengths_mm)),
           ADD CONSTRAINT products_dimensions_object CHECK (jsonb_typeof(dimensions) = 'object'),
           ADD CONSTRAINT products_span_table_array CHECK (span_table IS NULL OR jsonb_typeof(span_table) = 'array'),
           ADD CONSTRAINT products_material_object CHECK (material IS NULL OR jsonb_typeof(material) = 'object'),
           ADD CONSTRAINT products_board_max_centres_object CHECK (board_max_centres IS NULL OR jsonb_typeof(board_max_centres) = 'object')`,
        { transaction },
      );
      await queryInterface.addIndex('products', ['firm_id', 'sku'], {
        name: 'products_firm_id_sku_unique',
        unique: true,
        transaction,
      });
      await queryInterface.addIndex('products', ['firm_id', 'kind'], {
        name: 'products_firm_id_kind_idx',
        transaction,
      });
    });
  },

  async down(queryInterface) {
    await queryInterface.dropTable('products');
  },
};
