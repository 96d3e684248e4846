'use strict';
// The firm's business around the frame design: quoting settings, quotes and their revisions,
// deposit payments and the payment provider's webhook events, the e-mail outbox, team
// invitations, site photos and documents, and build stages. Money is integer minor units.

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
    const now = { type: Sequelize.DATE, allowNull: false, defaultValue: Sequelize.fn('now') };
    const timestamps = { created_at: now, updated_at: now };
    const q = (sql, transaction) => queryInterface.sequelize.query(sql, { transaction });

    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.createTable(
        'quote_settings',
        {
          firm_id: { ...firmId, primaryKey: true },
          margin_percent: { type: Sequelize.DECIMAL(6, 2), allowNull: false, defaultValue: 25 },
          tax_label: { type: Sequelize.TEXT, allowNull: false, defaultValue: 'VAT' },
          tax_rate_percent: { type: Sequelize.DECIMAL(5, 2), allowNull: false, defaultValue: 20 },
          deposit_percent: { type: Sequelize.DECIMAL(5, 2), allowNull: false, defaultValue: 30 },
          validity_days: { type: Sequelize.INTEGER, allowNull: false, defaultValue: 30 },
          crew_day_rate: { type: Sequelize.INTEGER, allowNull: false, defaultValue: 0 },
          labour_rate_per_m2: { type: Sequelize.INTEGER, allowNull: false, defaultValue: 0 },
          terms: { type: Sequelize.TEXT, allowNull: false, defaultValue: '' },
          ...timestamps,
        },
        { transaction },
      );
      await q(
        `ALTER TABLE quote_settings
           ADD CONSTRAINT quote_settings_ranges CHECK (margin_percent >= 0 AND tax_rate_percent >= 0
             AND deposit_percent BETWEEN 0 AND 100 AND validity_days > 0
             AND crew_day_rate >= 0 AND labour_rate_per_m2 >= 0)`,
        transaction,
      );

      await queryInterface.createTable(
        'quotes',
        {
          id,
          firm_id: firmId,
          job_id: { type: Sequelize.UUID, allowNull: false },
          design_id: { type: Sequelize.UUID, allowNull: true },
          design_version: { type: Sequelize.INTEGER, allowNull: true },
          number: { type: Sequelize.INTEGER, allowNull: false },
          title: { type: Sequelize.TEXT, allowNull: false },
          status: { type: Sequelize.TEXT, allowNull: false, defaultValue: 'draft' },
          revision: { type: Sequelize.INTEGER, allowNull: false, defaultValue: 1 },
          lines: { type: Sequelize.JSONB, allowNull: false, defaultValue: [] },
          currency: { type: Sequelize.CHAR(3), allowNull: false },
          margin_percent: { type: Sequelize.DECIMAL(6, 2), allowNull: false },
          tax_label: { type: Sequelize.TEXT, allowNull: false },
          tax_rate_percent: { type: Sequelize.DECIMAL(5, 2), allowNull: false },
          deposit_percent: { type: Sequelize.DECIMAL(5, 2), allowNull: false },
          valid_until: { type: Sequelize.DATEONLY, allowNull: false },
          terms: { type: Sequelize.TEXT, allowNull: false, defaultValue: '' },
          note: { type: Sequelize.TEXT, allowNull: false, defaultValue: '' },
          sent_at: { type: Sequelize.DATE, allowNull: true },
          sent_to: { type: Sequelize.TEXT, allowNull: true },
          sent_revision: { type: Sequelize.INTEGER, allowNull: true },
          link_expires_at: { type: Sequelize.DATE, allowNull: true },
          accepted_at: { type: Sequelize.DATE, allowNull: true },
          accepted_name: { type: Sequelize.TEXT, allowNull: true },
          declined_at: { type: Sequelize.DATE, allowNull: true },
          decline_reason: { type: Sequelize.TEXT, allowNull: true },
          created_by_id: userRef,
          updated_by_id: userRef,
          ...timestamps,
        },
        { transaction },
      );
      await q(
        `ALTER TABLE quotes
           ADD CONSTRAINT quotes_status_check CHECK (status IN ('draft', 'sent', 'accepted', 'declined', 'expired')),
           ADD CONSTRAINT quotes_revision_positive CHECK (revision >= 1),
           ADD CONSTRAINT quotes_lines_array CHECK (jsonb_typeof(lines) = 'array'),
           ADD CONSTRAINT quotes_title_not_blank CHECK (length(btrim(title)) > 0),
           ADD CONSTRAINT quotes_accepted_named CHECK (status <> 'accepted' OR (accepted_at IS NOT NULL AND accepted_name IS NOT NULL)),
           ADD CONSTRAINT quotes_job_same_firm FOREIGN KEY (firm_id, job_id)
             REFERENCES jobs (firm_id, id) ON DELETE CASCADE ON UPDATE CASCADE,
           ADD CONSTRAINT quotes_design_same_firm FOREIGN KEY (firm_id, design_id)
             REFERENCES designs (firm_id, id) ON DELETE SET NULL (design_id) ON UPDATE CASCADE,
           ADD CONSTRAINT quotes_firm_number_unique UNIQUE (firm_id, number),
           ADD CONSTRAINT quotes_firm_id_id_unique UNIQUE (firm_id, id)`,
        transaction,
      );
      await queryInterface.addIndex('quotes', ['job_id'], {
        name: 'quotes_job_id_idx',
        transaction,
      });

      await queryInterface.createTable(
        'quote_revisions',
        {
          id,
          firm_id: firmId,
          quote_id: { type: Sequelize.UUID, allowNull: false },
          revision: { type: Sequelize.INTEGER, allowNull: false },
          snapshot: { type: Sequelize.JSONB, allowNull: false },
          saved_by_id: userRef,
          saved_at: now,
        },
        { transaction },
      );
      await q(
        `ALTER TABLE quote_revisions
           ADD CONSTRAINT quote_revisions_quote_same_firm FOREIGN KEY (firm_id, quote_id)
             REFERENCES quotes (firm_id, id) ON DELETE CASCADE ON UPDATE CASCADE,
           ADD CONSTRAINT quote_revisions_unique UNIQUE (quote_id, revision)`,
        transaction,
      );

      await queryInterface.createTable(
        'payments',
        {
          id,
          firm_id: firmId,
          quote_id: { type: Sequelize.UUID, allowNull: false },
          job_id: { type: Sequelize.UUID, allowNull: false },
          provider: { type: Sequelize.TEXT, allowNull: false, defaultValue: 'stripe' },
          checkout_session_id: { type: Sequelize.TEXT, allowNull: false },
          amount: { type: Sequelize.INTEGER, allowNull: false },
          currency: { type: Sequelize.CHAR(3), allowNull: false },
          status: { type: Sequelize.TEXT, allowNull: false, defaultValue: 'pending' },
          paid_at: { type: Sequelize.DATE, allowNull: true },
          provider_event_id: { type: Sequelize.TEXT, allowNull: true },
          ...timestamps,
        },
        { transaction },
      );
      await q(
        `ALTER TABLE payments
           ADD CONSTRAINT payments_status_check CHECK (status IN ('pending', 'paid', 'failed', 'expired')),
           ADD CONSTRAINT payments_amount_positive CHECK (amount > 0),
           ADD CONSTRAINT payments_paid_has_time CHECK (status <> 'paid' OR paid_at IS NOT NULL),
           ADD CONSTRAINT payments_quote_same_firm FOREIGN KEY (firm_id, quote_id)
             REFERENCES quotes (firm_id, id) ON DELETE CASCADE ON UPDATE CASCADE,
           ADD CONSTRAINT payments_job_same_firm FOREIGN KEY (firm_id, job_id)
             REFERENCES jobs (firm_id, id) ON DELETE CASCADE ON UPDATE CASCADE,
           ADD CONSTRAINT payments_session_unique UNIQUE (provider, checkout_session_id)`,
        transaction,
      );
      // A quote's deposit is paid at most once, whatever arrives twice.
      await q(
        `CREATE UNIQUE INDEX payments_one_paid_per_quote ON payments (quote_id) WHERE status = 'paid'`,
        transaction,
      );
      await queryInterface.addIndex('payments', ['job_id'], {
        name: 'payments_job_id_idx',
        transaction,
      });

      await queryInterface.createTable(
        'webhook_events',
        {
          provider: { type: Sequelize.TEXT, allowNull: false, primaryKey: true },
          event_id: { type: Sequelize.TEXT, allowNull: false, primaryKey: true },
          type: { type: Sequelize.TEXT, allowNull: false },
          payload: { type: Sequelize.JSONB, allowNull: false },
          received_at: now,
          deliveries: { type: Sequelize.INTEGER, allowNull: false, defaultValue: 1 },
        },
        { transaction },
      );

      await queryInterface.createTable(
        'email_messages',
        {
          id,
          firm_id: { ...firmId, allowNull: true },
          kind: { type: Sequelize.TEXT, allowNull: false },
          to_address: { type: Sequelize.TEXT, allowNull: false },
          from_address: { type: Sequelize.TEXT, allowNull: false },
          reply_to: { type: Sequelize.TEXT, allowNull: true },
          subject: { type: Sequelize.TEXT, allowNull: false },
          text_body: { type: Sequelize.TEXT, allowNull: false },
          html_body: { type: Sequelize.TEXT, allowNull: true },
          attachments: { type: Sequelize.JSONB, allowNull: false, defaultValue: [] },
          status: { type: Sequelize.TEXT, allowNull: false, defaultValue: 'queued' },
          attempts: { type: Sequelize.INTEGER, allowNull: false, defaultValue: 0 },
          last_error: { type: Sequelize.TEXT, allowNull: true },
          next_attempt_at: now,
          locked_until: { type: Sequelize.DATE, allowNull: true },
          sent_at: { type: Sequelize.DATE, allowNull: true },
          provider_message_id: { type: Sequelize.TEXT, allowNull: true },
          job_id: { type: Sequelize.UUID, allowNull: true },
          quote_id: { type: Sequelize.UUID, allowNull: true },
          created_by_id: userRef,
          ...timestamps,
        },
        { transaction },
      );
      await q(
        `ALTER TABLE email_messages
           ADD CONSTRAINT email_messages_status_check CHECK (status IN ('queued', 'sending', 'sent', 'retrying', 'failed')),
           ADD CONSTRAINT email_messages_kind_check CHECK (kind IN ('quote', 'plan', 'order', 'invitation', 'receipt', 'other')),
           ADD CONSTRAINT email_messages_attachments_array CHECK (jsonb_typeof(attachments) = 'array'),
           ADD CONSTRAINT email_messages_job_fk FOREIGN KEY (job_id) REFERENCES jobs (id) ON DELETE SET NULL`,
        transaction,
      );
      await queryInterface.addIndex('email_messages', ['status', 'next_attempt_at'], {
        name: 'email_messages_due_idx',
        transaction,
      });
      await queryInterface.addIndex('email_messages', ['firm_id', 'created_at'], {
        name: 'email_messages_firm_idx',
        transaction,
      });

      await queryInterface.createTable(
        'invitations',
        {
          id,
          firm_id: firmId,
          email: { type: Sequelize.TEXT, allowNull: false },
          name: { type: Sequelize.TEXT, allowNull: false },
          role: { type: Sequelize.TEXT, allowNull: false },
          token_hash: { type: Sequelize.TEXT, allowNull: false, unique: true },
          invited_by_id: userRef,
          expires_at: { type: Sequelize.DATE, allowNull: false },
          accepted_at: { type: Sequelize.DATE, allowNull: true },
          accepted_user_id: userRef,
          revoked_at: { type: Sequelize.DATE, allowNull: true },
          ...timestamps,
        },
        { transaction },
      );
      await q(
        `ALTER TABLE invitations
           ADD CONSTRAINT invitations_role_check CHECK (role IN ('designer', 'crew')),
           ADD CONSTRAINT invitations_email_lowercase CHECK (email = lower(email) AND position('@' in email) > 1)`,
        transaction,
      );

      await queryInterface.createTable(
        'build_stages',
        {
          id,
          firm_id: firmId,
          job_id: { type: Sequelize.UUID, allowNull: false },
          stage: { type: Sequelize.TEXT, allowNull: false },
          done_on: { type: Sequelize.DATEONLY, allowNull: false },
          note: { type: Sequelize.TEXT, allowNull: false, defaultValue: '' },
          marked_by_id: userRef,
          ...timestamps,
        },
        { transaction },
      );
      await q(
        `ALTER TABLE build_stages
           ADD CONSTRAINT build_stages_stage_check CHECK (stage IN ('set_out', 'footings', 'frame', 'boards', 'finished')),
           ADD CONSTRAINT build_stages_job_same_firm FOREIGN KEY (firm_id, job_id)
             REFERENCES jobs (firm_id, id) ON DELETE CASCADE ON UPDATE CASCADE,
           ADD CONSTRAINT build_stages_job_stage_unique UNIQUE (job_id, stage),
           ADD CONSTRAINT build_stages_firm_id_id_unique UNIQUE (firm_id, id)`,
        transaction,
      );

      await queryInterface.createTable(
        'job_files',
        {
          id,
          firm_id: firmId,
          job_id: { type: Sequelize.UUID, allowNull: false },
          stage_id: { type: Sequelize.UUID, allowNull: true },
          kind: { type: Sequelize.TEXT, allowNull: false },
          storage_key: { type: Sequelize.TEXT, allowNull: false, unique: true },
          thumb_key: { type: Sequelize.TEXT, allowNull: true },
          mime: { type: Sequelize.TEXT, allowNull: false },
          size_bytes: { type: Sequelize.INTEGER, allowNull: false },
          original_name: { type: Sequelize.TEXT, allowNull: false },
          width: { type: Sequelize.INTEGER, allowNull: true },
          height: { type: Sequelize.INTEGER, allowNull: true },
          caption: { type: Sequelize.TEXT, allowNull: false, defaultValue: '' },
          uploaded_by_id: userRef,
          ...timestamps,
        },
        { transaction },
      );
      await q(
        `ALTER TABLE job_files
           ADD CONSTRAINT job_files_kind_check CHECK (kind IN ('photo', 'document')),
           ADD CONSTRAINT job_files_mime_check CHECK (mime IN ('image/jpeg', 'image/png', 'image/webp', 'application/pdf')),
           ADD CONSTRAINT job_files_size_positive CHECK (size_bytes > 0),
           ADD CONSTRAINT job_files_job_same_firm FOREIGN KEY (firm_id, job_id)
             REFERENCES jobs (firm_id, id) ON DELETE CASCADE ON UPDATE CASCADE,
           ADD CONSTRAINT job_files_stage_same_firm FOREIGN KEY (firm_id, stage_id)
             REFERENCES build_stages (firm_id, id) ON DELETE SET NULL (stage_id) ON UPDATE CASCADE`,
        transaction,
      );
      await queryInterface.addIndex('job_files', ['job_id', 'created_at'], {
        name: 'job_files_job_idx',
        transaction,
      });
    });
  },

  async down(queryInterface) {
    for (const t of [
      'job_files',
      'build_stages',
      'invitations',
      'email_messages',
      'webhook_events',
      'payments',
      'quote_revisions',
      'quotes',
      'quote_settings',
    ])
      await queryInterface.dropTable(t);
  },
};
