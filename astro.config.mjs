// @ts-check
import { defineConfig, envField } from 'astro/config';
import node from '@astrojs/node';
import react from '@astrojs/react';
import tailwindcss from '@tailwindcss/vite';
import { fileURLToPath } from 'node:url';

// Server output on Node (standalone). Configuration is read at run time through astro:env:
// scripts/start.mjs and scripts/test.mjs set these for the local database and fakes.
export default defineConfig({
  output: 'server',
  adapter: node({ mode: 'standalone' }),
  integrations: [react()],
  security: { checkOrigin: true },
  vite: {
    plugins: [tailwindcss()],
    resolve: {
      alias: {
        '@shared': fileURLToPath(new URL('./shared', import.meta.url)),
        '@db': fileURLToPath(new URL('./db', import.meta.url)),
      },
    },
  },
  env: {
    schema: {
      DATABASE_URL: envField.string({ context: 'server', access: 'secret' }),
      SMTP_HOST: envField.string({ context: 'server', access: 'secret', default: '127.0.0.1' }),
      SMTP_PORT: envField.number({ context: 'server', access: 'secret', default: 2525 }),
      MAIL_FROM: envField.string({ context: 'server', access: 'secret', default: 'Threadway <no-reply@threadway.test>' }),
      MAIL_CAPTURE_DIR: envField.string({ context: 'server', access: 'secret', optional: true }),
      DEV_TOOLS: envField.boolean({ context: 'server', access: 'secret', default: false }),
      PUBLIC_ORIGIN: envField.string({ context: 'server', access: 'secret', optional: true }),
      RATE_LIMIT_SCALE: envField.number({ context: 'server', access: 'secret', default: 1 }),
    },
  },
});
