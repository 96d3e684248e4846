import nextVitals from 'eslint-config-next/core-web-vitals';
import nextTs from 'eslint-config-next/typescript';

const engineBanned = [
  'react',
  'react-dom',
  'konva',
  'react-konva',
  'next',
  'zustand',
  'sequelize',
  'pg',
  'next-auth',
];

const config = [
  ...nextVitals,
  ...nextTs,
  {
    ignores: [
      'node_modules/**',
      '.next/**',
      '.next-*/**',
      '.tmp/**',
      '.data/**',
      'tests/artifacts/**',
      'next-env.d.ts',
    ],
  },
  {
    // The engine is a leaf: plain data in, plain data out (STYLE.md habit 1).
    files: ['engine/**/*.ts'],
    ignores: ['engine/cli/**'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          paths: engineBanned.map((name) => ({
            name,
            message: 'engine/ must stay pure TypeScript',
          })),
          patterns: [
            {
              group: engineBanned.map((n) => `${n}/*`),
              message: 'engine/ must stay pure TypeScript',
            },
            {
              group: ['@/app/*', '@/components/*', '@/canvas/*', '@/models/*', '@/lib/*'],
              message: 'engine/ imports only engine/',
            },
          ],
        },
      ],
    },
  },
  {
    files: ['migrations/**/*.cjs', 'seeders/**/*.cjs', '**/*.cjs'],
    rules: { '@typescript-eslint/no-require-imports': 'off' },
  },
];

export default config;
