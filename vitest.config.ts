import { configDefaults, defineConfig } from 'vitest/config';
import { importAliases } from './importAliases.mjs';

// Two projects: `unit` needs nothing running; `app` needs the database, mail sink and built server
// that scripts/test.mjs starts and describes through environment variables (see DEVELOPERS.md).
export default defineConfig({
  resolve: { alias: importAliases },
  test: {
    projects: [
      {
        extends: true,
        test: {
          name: 'unit',
          include: ['shared/**/*.test.ts', 'src/**/*.test.ts', 'db/**/*.test.ts', 'tests/unit/**/*.test.ts', 'tests/reference/**/*.test.ts'],
          // Fake source trees the architecture test reads; their *.test.ts files are planted imports, not tests.
          exclude: [...configDefaults.exclude, 'tests/unit/fixtures/**'],
          environment: 'node',
          testTimeout: 60_000,
        },
      },
      {
        extends: true,
        test: {
          name: 'app',
          include: ['tests/api/**/*.test.ts', 'tests/browser/**/*.test.ts'],
          environment: 'node',
          testTimeout: 120_000,
          hookTimeout: 120_000,
          // One file at a time: browser and API files share one server and database.
          poolOptions: { forks: { singleFork: true } },
        },
      },
    ],
  },
});
