'use strict';
// Quoting defaults for the demo firms (invented numbers for the demo only): margin, VAT, deposit,
// validity, crew day rate and labour per m^2, and the terms printed on every quote.
const firms = [
  {
    id: '1a4c0000-0000-4000-8000-000000000001', // Larchfield Decks
    crewDayRate: 48000, // £480 a day for a two-person crew (demo)
    labourRatePerM2: 4500, // £45 per m^2 (demo)
  },
  {
    id: '1a4c0000-0000-4000-8000-000000000002', // Orchard Row Carpentry
    crewDayRate: 42000,
    labourRatePerM2: 4000,
  },
];

const terms =
  'Prices are valid until the date shown. The deposit secures a build date; the balance is due on completion. ' +
  'Ground conditions found on digging (buried services, soft ground, roots) may change the price; we will agree any change with you first.';

/** @type {import('sequelize-cli').Migration} */
module.exports = {
  async up(queryInterface) {
    for (const f of firms) {
      await queryInterface.sequelize.query(
        `INSERT INTO quote_settings (firm_id, margin_percent, tax_label, tax_rate_percent, deposit_percent,
           validity_days, crew_day_rate, labour_rate_per_m2, terms, created_at, updated_at)
         SELECT :id, 25, 'VAT', 20, 30, 30, :crew, :m2, :terms, now(), now()
         WHERE EXISTS (SELECT 1 FROM firms WHERE id = :id)
         ON CONFLICT (firm_id) DO NOTHING`,
        { replacements: { id: f.id, crew: f.crewDayRate, m2: f.labourRatePerM2, terms } },
      );
    }
  },

  async down(queryInterface) {
    await queryInterface.bulkDelete('quote_settings', { firm_id: firms.map((f) => f.id) });
  },
};
