'use strict';
// Designs (a deck design document per engine/schema.ts, versioned for optimistic concurrency)
// and their revisions (one row per saved version).

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
    const userRef = {
      type: Sequelize.UUID,
      allowNull: true,
      references: { model: 'users', key: 'id' },
      onDelete: 'SET NULL',
      onUpdate: 'CASCADE',
    };

    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.createTable(
        'designs',
        {
          id,
          firm_id: firmId,
          job_id: { type: Sequelize.UUID, allowNull: false },
          name: { type: Sequelize.TEXT, allowNull: false },
          document: { type: Sequelize.JSONB, allowNull: false },
          version: { type: Sequelize.INTEGER, allowNull: false, defaultValue: 1 },
          updated_by_id: userRef,
          created_at: { type: Sequelize.DATE, allowNull: false, defaultValue: Sequelize.fn('now') },
          updated_at: { type: Sequelize.DATE, allowNull: false, defaultValue: Sequelize.fn('now') },
        },
        { transaction },
      );
      await queryInterface.sequelize.query(
        `ALTER TABLE designs
           ADD CONSTRAINT designs_version_positive CHECK (version >= 1),
           ADD CONSTRAINT designs_name_not_blank CHECK (length(btrim(name)) > 0),
           ADD CONSTRAINT designs_document_object CHECK (jsonb_typeof(document) = 'object'),
           ADD CONSTRAINT designs_job_same_firm FOREIGN KEY (firm_id, job_id)
             REFERENCES jobs (firm_id, id) ON DELETE CASCADE ON UPDATE CASCADE,
           ADD CONSTRAINT designs_firm_id_id_unique UNIQUE (firm_id, id)`,
        { transaction },
      );
      await queryInterface.addIndex('designs', ['job_id'], {
        name: 'designs_job_id_idx',
        transaction,
      });
      await queryInterface.addIndex('designs', ['firm_id', 'updated_at'], {
        name: 'designs_firm_id_updated_at_idx',
        transaction,
      });

      await queryInterface.createTable(
        'design_revisions',
        {
          id,
          design_id: { type: Sequelize.UUID, allowNull: false },
          firm_id: firmId,
          version: { type: Sequelize.INTEGER, allowNull: false },
          document: { type: Sequelize.JSONB, allowNull: false },
          saved_by_id: userRef,
          saved_at: { type: Sequelize.DATE, allowNull: false, defaultValue: Sequelize.fn('now') },
        },
        { transaction },
      );
      await queryInterface.sequelize.query(
        `ALTER TABLE design_revisions
           ADD CONSTRAINT design_revisions_version_positive CHECK (version >= 1),
           ADD CONSTRAINT design_revisions_design_same_firm FOREIGN KEY (firm_id, design_id)
             REFERENCES designs (firm_id, id) ON DELETE CASCADE ON UPDATE CASCADE`,
        { transaction },
      );
      await queryInterface.addIndex('design_revisions', ['design_id', 'version'], {
        name: 'design_revisions_design_id_version_unique',
        unique: true,
        transaction,
      });
      await queryInterface.addIndex('design_revisions', ['firm_id'], {
        name: 'design_revisions_firm_id_idx',
        transaction,
      });
    });
  },

  async down(queryInterface) {
    await queryInterface.dropTable('design_revisions');
    await queryInterface.dropTable('designs');
  },
};
