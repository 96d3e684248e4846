'use strict';
// Clients (the homeowners) and jobs (one deck enquiry through to a finished build).

/** @type {import('sequelize-cli').Migration} */
module.exports = {
  async up(queryInterface, Sequelize) {
    const id = {
      type: Sequelize.UUID,
      primaryKey: true,
      allowNull: false,
      defaultValue: Sequelize.literal('gen_random_uuid()'),
    };
    const firmId = {
      type: Sequelize.UUID,
      allowNull: false,
      references: { model: 'firms', key: 'id' },
      onDelete: 'CASCADE',
      onUpdate: 'CASCADE',
    };
    const timestamps = {
      created_at: { type: Sequelize.DATE, allowNull: false, defaultValue: Sequelize.fn('now') },
      updated_at: { type: Sequelize.DATE, allowNull: false, defaultValue: Sequelize.fn('now') },
    };

    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.createTable(
        'clients',
        {
          id,
          firm_id: firmId,
          name: { type: Sequelize.TEXT, allowNull: false },
          email: { type: Sequelize.TEXT, allowNull: true },
          phone: { type: Sequelize.TEXT, allowNull: true },
          address: { type: Sequelize.TEXT, allowNull: true },
          ...timestamps,
        },
        { transaction },
      );
      await queryInterface.sequelize.query(
        `ALTER TABLE clients
           ADD CONSTRAINT clients_name_not_blank CHECK (length(btrim(name)) > 0),
           -- lets jobs reference (firm_id, id) so a job can never point at another firm's client
           ADD CONSTRAINT clients_firm_id_id_unique UNIQUE (firm_id, id)`,
        { transaction },
      );
      await queryInterface.addIndex('clients', ['firm_id', 'name'], {
        name: 'clients_firm_id_name_idx',
        transaction,
      });

      await queryInterface.createTable(
        'jobs',
        {
          id,
          firm_id: firmId,
          client_id: { type: Sequelize.UUID, allowNull: true },
          title: { type: Sequelize.TEXT, allowNull: false },
          site_address: { type: Sequelize.TEXT, allowNull: false, defaultValue: '' },
          status: { type: Sequelize.TEXT, allowNull: false, defaultValue: 'enquiry' },
          notes: { type: Sequelize.TEXT, allowNull: false, defaultValue: '' },
          created_by_id: {
            type: Sequelize.UUID,
            allowNull: true,
            references: { model: 'users', key: 'id' },
            onDelete: 'SET NULL',
            onUpdate: 'CASCADE',
          },
          ...timestamps,
        },
        { transaction },
      );
      await queryInterface.sequelize.query(
        `ALTER TABLE jobs
           ADD CONSTRAINT jobs_status_check CHECK (status IN
             ('enquiry', 'surveyed', 'designing', 'quoted', 'accepted', 'building', 'complete', 'lost')),
           ADD CONSTRAINT jobs_title_not_blank CHECK (length(btrim(title)) > 0),
           ADD CONSTRAINT jobs_client_same_firm FOREIGN KEY (firm_id, client_id)
             REFERENCES clients (firm_id, id) ON DELETE SET NULL (client_id) ON UPDATE CASCADE,
           ADD CONSTRAINT jobs_firm_id_id_unique UNIQUE (firm_id, id)`,
        { transaction },
      );
      await queryInterface.addIndex('jobs', ['firm_id'], { name: 'jobs_firm_id_idx', transaction });
      await queryInterface.addIndex('jobs', ['firm_id', 'status'], {
        name: 'jobs_firm_id_status_idx',
        transaction,
      });
      await queryInterface.addIndex('jobs', ['firm_id', 'updated_at'], {
        name: 'jobs_firm_id_updated_at_idx',
        transaction,
      });
      await queryInterface.addIndex('jobs', ['client_id'], {
        name: 'jobs_client_id_idx',
        transaction,
      });
    });
  },

  async down(queryInterface) {
    await queryInterface.dropTable('jobs');
    await queryInterface.dropTable('clients');
  },
};
