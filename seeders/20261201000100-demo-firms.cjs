'use strict';
// The demo firm (Larchfield Decks, invented) with its team, clients, jobs and designs, and a second
// firm (Orchard Row Carpentry, invented) used to prove that firms never see each other's data.
// Ids are fixed so the seed is idempotent (ON CONFLICT DO NOTHING) and tests can name records.
const bcrypt = require('bcryptjs');

const DEMO_PASSWORD = 'deckdemo-2026';

const ids = {
  larchfield: '1a4c0000-0000-4000-8000-000000000001',
  orchardRow: '1a4c0000-0000-4000-8000-000000000002',
  owner: '1a4c0000-0000-4000-8001-000000000001',
  designer: '1a4c0000-0000-4000-8001-000000000002',
  crew: '1a4c0000-0000-4000-8001-000000000003',
  orchardOwner: '1a4c0000-0000-4000-8001-000000000011',
  clientOkafor: '1a4c0000-0000-4000-8002-000000000001',
  clientPemberton: '1a4c0000-0000-4000-8002-000000000002',
  clientRao: '1a4c0000-0000-4000-8002-000000000003',
  clientOrchard: '1a4c0000-0000-4000-8002-000000000011',
  jobPatio: '1a4c0000-0000-4000-8003-000000000001',
  jobLShape: '1a4c0000-0000-4000-8003-000000000002',
  jobPond: '1a4c0000-0000-4000-8003-000000000003',
  jobReplacement: '1a4c0000-0000-4000-8003-000000000004',
  jobSummerhouse: '1a4c0000-0000-4000-8003-000000000005',
  jobBalcony: '1a4c0000-0000-4000-8003-000000000006',
  jobOrchard: '1a4c0000-0000-4000-8003-000000000011',
  designPatio: '1a4c0000-0000-4000-8004-000000000001',
  designLShape: '1a4c0000-0000-4000-8004-000000000002',
  designPond: '1a4c0000-0000-4000-8004-000000000003',
  designOrchard: '1a4c0000-0000-4000-8004-000000000011',
};

/** A version-1 design document with every default of engine/schema.ts filled in. */
function designDocument(overrides) {
  return {
    version: 1,
    outline: [
      [0, 0],
      [6000, 0],
      [6000, 4000],
      [0, 4000],
    ],
    boardAngleDeg: 0,
    heightMm: 450,
    joistCentresMm: 400,
    borderCourses: 1,
    supports: [],
    steps: [],
    joist: { widthMm: 50, depthMm: 125, stockMm: 3000, maxSpanMm: 1500, maxCantileverMm: 100 },
    board: { widthMm: 140, gapMm: 5, endGapMm: 4, stockMm: 4800, maxSpanMm: 400 },
    codeBasis: 'uk',
    stairCentresMm: 300,
    minStaggerMm: 800,
    nogginRule: { kind: 'midspan', overMm: 1200 },
    postsFromHeightMm: 600,
    kerfMm: 3,
    minOffcutMm: 300,
    products: {},
    ...overrides,
  };
}

const documents = {
  // The 6 m x 4 m example of PRODUCT.md section 4.
  patio: designDocument({}),
  // An L-shape, 7 m along the house and 5 m down the garden, with a two-step flight to the lawn.
  lShape: designDocument({
    outline: [
      [0, 0],
      [7000, 0],
      [7000, 2500],
      [3500, 2500],
      [3500, 5000],
      [0, 5000],
    ],
    heightMm: 380,
    steps: [{ edge: 0, offsetMm: 1200, widthMm: 1800, count: 2, treadBoards: 3 }],
  }),
  // Boards at 45 degrees: closer joist centres (common practice for angled boards).
  pond: designDocument({
    outline: [
      [0, 0],
      [5000, 0],
      [5000, 3600],
      [0, 3600],
    ],
    boardAngleDeg: 45,
    heightMm: 300,
    joistCentresMm: 300,
    borderCourses: 1,
  }),
  orchard: designDocument({
    outline: [
      [0, 0],
      [4000, 0],
      [4000, 3000],
      [0, 3000],
    ],
    heightMm: 250,
    borderCourses: 0,
  }),
};

const daysAgo = (now, days) => new Date(now.getTime() - days * 24 * 3600 * 1000);

module.exports = {
  ids,
  async up(queryInterface) {
    const now = new Date();
    const hash = bcrypt.hashSync(DEMO_PASSWORD, 10);
    const stamp = (days) => ({
      created_at: daysAgo(now, days + 7),
      updated_at: daysAgo(now, days),
    });
    const opts = { ignoreDuplicates: true };

    await queryInterface.sequelize.transaction(async (transaction) => {
      const o = { ...opts, transaction };
      await queryInterface.bulkInsert(
        'firms',
        [
          {
            id: ids.larchfield,
            name: 'Larchfield Decks',
            address: '4 Mill Lane',
            town: 'Kestrelford',
            postcode: 'KF3 2LD',
            phone: '01632 960 418',
            email: 'office@larchfield.example',
            currency: 'GBP',
            ...stamp(30),
          },
          {
            id: ids.orchardRow,
            name: 'Orchard Row Carpentry',
            address: '17 Orchard Row',
            town: 'Brindlecombe',
            postcode: 'BC7 4RW',
            phone: '01632 960 772',
            email: 'office@orchardrow.example',
            currency: 'GBP',
            ...stamp(30),
          },
        ],
        o,
      );

      const user = (id, firmId, name, email, role, units) => ({
        id,
        firm_id: firmId,
        name,
        email,
        role,
        password_hash: hash,
        units,
        active: true,
        ...stamp(30),
      });
      await queryInterface.bulkInsert(
        'users',
        [
          user(
            ids.owner,
            ids.larchfield,
            'Harriet Vane',
            'owner@larchfield.example',
            'owner',
            'metric',
          ),
          user(
            ids.designer,
            ids.larchfield,
            'Tom Ashby',
            'designer@larchfield.example',
            'designer',
            'metric',
          ),
          user(
            ids.crew,
            ids.larchfield,
            'Priya Nandi',
            'crew@larchfield.example',
            'crew',
            'imperial',
          ),
          user(
            ids.orchardOwner,
            ids.orchardRow,
            'Owen Marsh',
            'owner@orchardrow.example',
            'owner',
            'metric',
          ),
        ],
        o,
      );

      await queryInterface.bulkInsert(
        'clients',
        [
          {
            id: ids.clientOkafor,
            firm_id: ids.larchfield,
            name: 'Margaret Okafor',
            email: 'margaret.okafor@example.com',
            phone: '07700 900 114',
            address: '22 Heron Close, Kestrelford, KF3 5HN',
            ...stamp(25),
          },
          {
            id: ids.clientPemberton,
            firm_id: ids.larchfield,
            name: 'Daniel and Ruth Pemberton',
            email: 'pembertons@example.com',
            phone: '07700 900 382',
            address: 'Willow Barn, Sedge Lane, Kestrelford, KF4 1SL',
            ...stamp(20),
          },
          {
            id: ids.clientRao,
            firm_id: ids.larchfield,
            name: 'Sunita Rao',
            email: 'sunita.rao@example.com',
            phone: '07700 900 927',
            address: '3 Millpond Cottages, Kestrelford, KF3 9MP',
            ...stamp(15),
          },
          {
            id: ids.clientOrchard,
            firm_id: ids.orchardRow,
            name: 'Alan Fenwick',
            email: 'alan.fenwick@example.com',
            phone: '07700 900 551',
            address: '9 Quarry Road, Brindlecombe, BC7 2QR',
            ...stamp(12),
          },
        ],
        o,
      );

      const job = (id, firmId, clientId, title, siteAddress, status, notes, createdById, days) => ({
        id,
        firm_id: firmId,
        client_id: clientId,
        title,
        site_address: siteAddress,
        status,
        notes,
        created_by_id: createdById,
        ...stamp(days),
      });
      await queryInterface.bulkInsert(
        'jobs',
        [
          job(
            ids.jobPatio,
            ids.larchfield,
            ids.clientOkafor,
            'Patio deck off the kitchen',
            '22 Heron Close, Kestrelford, KF3 5HN',
            'designing',
            'Level garden. Threshold of the kitchen door 470 mm above the patio slab.',
            ids.designer,
            1,
          ),
          job(
            ids.jobLShape,
            ids.larchfield,
            ids.clientPemberton,
            'L-shaped deck with steps to the lawn',
            'Willow Barn, Sedge Lane, Kestrelford, KF4 1SL',
            'quoted',
            'Ground falls about 150 mm towards the lawn. Two steps down on the south side.',
            ids.designer,
            3,
          ),
          job(
            ids.jobPond,
            ids.larchfield,
            ids.clientRao,
            'Diagonal-board deck by the pond',
            '3 Millpond Cottages, Kestrelford, KF3 9MP',
            'building',
            'Boards at 45 degrees; keep 300 mm clear of the pond liner.',
            ids.owner,
            2,
          ),
          job(
            ids.jobReplacement,
            ids.larchfield,
            ids.clientOkafor,
            'Replace rotten side-path boards',
            '22 Heron Close, Kestrelford, KF3 5HN',
            'enquiry',
            'Phoned in; survey to book.',
            ids.owner,
            0,
          ),
          job(
            ids.jobSummerhouse,
            ids.larchfield,
            ids.clientRao,
            'Summerhouse landing',
            '3 Millpond Cottages, Kestrelford, KF3 9MP',
            'complete',
            '',
            ids.designer,
            40,
          ),
          job(
            ids.jobBalcony,
            ids.larchfield,
            ids.clientPemberton,
            'Raised deck at the barn door',
            'Willow Barn, Sedge Lane, Kestrelford, KF4 1SL',
            'lost',
            'Client chose a stone terrace instead.',
            ids.designer,
            20,
          ),
          job(
            ids.jobOrchard,
            ids.orchardRow,
            ids.clientOrchard,
            'Garden deck at Quarry Road',
            '9 Quarry Road, Brindlecombe, BC7 2QR',
            'surveyed',
            '',
            ids.orchardOwner,
            4,
          ),
        ],
        o,
      );

      const design = (id, firmId, jobId, name, document, updatedById, days) => ({
        id,
        firm_id: firmId,
        job_id: jobId,
        name,
        document: JSON.stringify(document),
        version: 1,
        updated_by_id: updatedById,
        ...stamp(days),
      });
      const designs = [
        design(
          ids.designPatio,
          ids.larchfield,
          ids.jobPatio,
          '6 m x 4 m rectangle',
          documents.patio,
          ids.designer,
          1,
        ),
        design(
          ids.designLShape,
          ids.larchfield,
          ids.jobLShape,
          'L-shape with steps',
          documents.lShape,
          ids.designer,
          3,
        ),
        design(
          ids.designPond,
          ids.larchfield,
          ids.jobPond,
          'Boards at 45 degrees',
          documents.pond,
          ids.owner,
          2,
        ),
        design(
          ids.designOrchard,
          ids.orchardRow,
          ids.jobOrchard,
          'Quarry Road deck',
          documents.orchard,
          ids.orchardOwner,
          4,
        ),
      ];
      await queryInterface.bulkInsert('designs', designs, o);
      await queryInterface.bulkInsert(
        'design_revisions',
        designs.map((d, i) => ({
          id: `1a4c0000-0000-4000-8005-${String(i + 1).padStart(12, '0')}`,
          design_id: d.id,
          firm_id: d.firm_id,
          version: 1,
          document: d.document,
          saved_by_id: d.updated_by_id,
          saved_at: d.updated_at,
        })),
        o,
      );
    });
  },

  async down(queryInterface) {
    // Cascades remove users, clients, jobs, designs, revisions and products of both firms.
    await queryInterface.bulkDelete('firms', { id: [ids.larchfield, ids.orchardRow] });
  },
};
