'use strict';
// Firms (the tenant) and their users. Every firm-owned table carries firm_id.

/** @type {import('sequelize-cli').Migration} */
module.exports = {
  async up(queryInterface, Sequelize) {
    const id = {
      type: Sequelize.UUID,
      primaryKey: true,
      allowNull: false,
      defaultValue: Sequelize.literal('gen_random_uuid()'),
    };
    const timestamps = {
      created_at: { type: Sequelize.DATE, allowNull: false, defaultValue: Sequelize.fn('now') },
      updated_at: { type: Sequelize.DATE, allowNull: false, defaultValue: Sequelize.fn('now') },
    };

    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.createTable(
        'firms',
        {
          id,
          name: { type: Sequelize.TEXT, allowNull: false },
          address: { type: Sequelize.TEXT, allowNull: false, defaultValue: '' },
          town: { type: Sequelize.TEXT, allowNull: false, defaultValue: '' },
          postcode: { type: Sequelize.TEXT, allowNull: false, defaultValue: '' },
          phone: { type: Sequelize.TEXT, allowNull: true },
          email: { type: Sequelize.TEXT, allowNull: true },
          currency: { type: Sequelize.CHAR(3), allowNull: false, defaultValue: 'GBP' },
          ...timestamps,
        },
        { transaction },
      );
      await queryInterface.sequelize.query(
        `ALTER TABLE firms
           ADD CONSTRAINT firms_name_not_blank CHECK (length(btrim(name)) > 0),
           ADD CONSTRAINT firms_currency_upper CHECK (currency ~ '^[A-Z]{3}$')`,
        { transaction },
      );

      await queryInterface.createTable(
        'users',
        {
          id,
          firm_id: {
            type: Sequelize.UUID,
            allowNull: false,
            references: { model: 'firms', key: 'id' },
            onDelete: 'CASCADE',
            onUpdate: 'CASCADE',
          },
          name: { type: Sequelize.TEXT, allowNull: false },
          email: { type: Sequelize.TEXT, allowNull: false },
          role: { type: Sequelize.TEXT, allowNull: false, defaultValue: 'designer' },
          password_hash: { type: Sequelize.TEXT, allowNull: false },
          units: { type: Sequelize.TEXT, allowNull: false, defaultValue: 'metric' },
          active: { type: Sequelize.BOOLEAN, allowNull: false, defaultValue: true },
          ...timestamps,
        },
        { transaction },
      );
      await queryInterface.sequelize.query(
        `ALTER TABLE users
           ADD CONSTRAINT users_role_check CHECK (role IN ('owner', 'designer', 'crew')),
           ADD CONSTRAINT users_units_check CHECK (units IN ('metric', 'imperial')),
           ADD CONSTRAINT users_email_lowercase CHECK (email = lower(email) AND position('@' in email) > 1),
           ADD CONSTRAINT users_name_not_blank CHECK (length(btrim(name)) > 0)`,
        { transaction },
      );
      // One account per address across all firms: sign-in looks users up by email alone.
      await queryInterface.sequelize.query(
        'CREATE UNIQUE INDEX users_email_lower_unique ON users (lower(email))',
        { transaction },
      );
      await queryInterface.addIndex('users', ['firm_id'], {
        name: 'users_firm_id_idx',
        transaction,
      });
    });
  },

  async down(queryInterface) {
    await queryInterface.dropTable('users');
    await queryInterface.dropTable('firms');
  },
};
