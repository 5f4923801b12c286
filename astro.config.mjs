// @ts-check
import { defineConfig, envField } from 'astro/config';
import node from '@astrojs/node';
import react from '@astrojs/react';
import tailwindcss from '@tailwindcss/vite';
import { fileURLToPath } from 'node:url';
import { importAliases } from './importAliases.mjs';

// Server output on Node (standalone). Configuration is read at run time through astro:env:
// scripts/start.mjs and scripts/test.mjs set these for the local database and fakes.
export default defineConfig({
  output: 'server',
  adapter: node({ mode: 'standalone' }),
  integrations: [
    react(),
    {
      // Zod's eval probe would trip the page policy (no 'unsafe-eval'); see src/components/zodJitless.ts.
      name: 'threadway-zod-jitless',
      hooks: {
        'astro:config:setup': ({ injectScript }) => {
          injectScript('before-hydration', `import ${JSON.stringify(fileURLToPath(new URL('./src/components/zodJitless.ts', import.meta.url)))};`);
        },
      },
    },
  ],
  // allowedDomains: the Host names the Node adapter may put into Astro's request URL. Without them it
  // uses "localhost" with no port, so url.origin never equals a browser's Origin and checkOrigin refuses
  // every form post. Loopback for npm start / npm test; a deployment adds its host by setting
  // PUBLIC_ORIGIN when it builds.
  // Astro hashes its own inline scripts (island hydration, client directives) and sends them in a CSP header on
  // every page; src/server/securityHeaders.ts keeps those hashes as the only inline scripts allowed and adds the
  // rest of the policy. (Stable as `security.csp` in later Astro versions.)
  experimental: { csp: true },
  security: {
    checkOrigin: true,
    allowedDomains: [
      { hostname: '127.0.0.1' },
      { hostname: 'localhost' },
      ...(process.env.PUBLIC_ORIGIN ? [{ hostname: new URL(process.env.PUBLIC_ORIGIN).hostname }] : []),
    ],
  },
  vite: {
    plugins: [tailwindcss()],
    resolve: {
      alias: importAliases,
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
      // Reverse proxies whose X-Forwarded-For is believed: comma-separated addresses or CIDR ranges
      // (e.g. "127.0.0.1,10.0.0.0/8"). Empty (the default): the connecting address is the client.
      // Needs the server started through scripts/serve.mjs (npm start / npm test do; see README "Security").
      TRUSTED_PROXIES: envField.string({ context: 'server', access: 'secret', default: '' }),
      // Photo storage (S3 API). npm start / npm test point these at the local s3rver fake on loopback.
      S3_ENDPOINT: envField.string({ context: 'server', access: 'secret', optional: true }),
      S3_BUCKET: envField.string({ context: 'server', access: 'secret', default: 'uploads' }),
      S3_REGION: envField.string({ context: 'server', access: 'secret', default: 'us-east-1' }),
      S3_ACCESS_KEY: envField.string({ context: 'server', access: 'secret', optional: true }),
      S3_SECRET_KEY: envField.string({ context: 'server', access: 'secret', optional: true }),
      // HMAC key for class invitation links; when unset, one is generated once and kept in the database.
      INVITE_SECRET: envField.string({ context: 'server', access: 'secret', optional: true }),
      // Seconds between lesson-release sweeps (e-mails to students when a lesson opens).
      RELEASE_SWEEP_SECONDS: envField.number({ context: 'server', access: 'secret', default: 30 }),
      // Paid classes (the payments service's SDK, npm `stripe`). PAYMENTS_API_URL points the SDK at another host:
      // npm start / npm test set it to the local fake (scripts/lib/paymentsFake.mjs); unset, the SDK uses the real
      // service. Without PAYMENTS_API_KEY and PAYMENTS_WEBHOOK_SECRET paid classes cannot be bought (free ones work).
      PAYMENTS_API_URL: envField.string({ context: 'server', access: 'secret', optional: true }),
      PAYMENTS_API_KEY: envField.string({ context: 'server', access: 'secret', optional: true }),
      PAYMENTS_WEBHOOK_SECRET: envField.string({ context: 'server', access: 'secret', optional: true }),
    },
  },
});
