// The import aliases, one list for Astro's Vite, Vitest and (mirrored in tsconfig.json "paths") the type checker
// and tsx. esbuild (the engine worker bundle) reads tsconfig.json's paths itself.
import { fileURLToPath } from 'node:url';

const here = (folder) => fileURLToPath(new URL(folder, import.meta.url));

export const importAliases = {
  '@shared': here('./shared'),
  '@db': here('./db'),
  '@server': here('./src/server'),
  '@components': here('./src/components'),
  '@layouts': here('./src/layouts'),
};
