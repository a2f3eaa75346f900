// @ts-check
import node from '@astrojs/node';
import react from '@astrojs/react';
import tailwind from '@astrojs/tailwind';
import { defineConfig, envField } from 'astro/config';
import { workerEntries } from './src/integrations/worker-entries.mjs';

// Every variable is a server secret so it is read when the server starts, not baked into the build:
// one build runs anywhere, configured by its environment.
const secret = (extra = {}) => envField.string({ context: 'server', access: 'secret', ...extra });

export default defineConfig({
  output: 'server',
  adapter: node({ mode: 'standalone' }),
  outDir: process.env.CLAYBANK_BUILD_DIR ?? './dist',
  server: { host: '127.0.0.1', port: 4321 },
  integrations: [react(), tailwind({ applyBaseStyles: false, configFile: './src/styles/tailwind.config.mjs' }), workerEntries()],
  devToolbar: { enabled: false },
  // Origins are checked in src/middleware.ts against APP_URL, read at run time, so one build serves
  // any host name; Astro's own check compares with the Host header, which a proxy may rewrite.
  security: { checkOrigin: false },
  env: {
    schema: {
      APP_URL: secret({ default: 'http://127.0.0.1:4321' }),
      APP_MODE: envField.enum({
        context: 'server',
        access: 'secret',
        values: ['development', 'production'],
        default: 'production',
      }),
      DATABASE_URL: secret({ optional: true }),
      BETTER_AUTH_SECRET: secret({ optional: true }),
      SMTP_URL: secret({ default: 'smtp://127.0.0.1:2525' }),
      MAIL_FROM: secret({ default: 'Claybank <no-reply@claybank.example.test>' }),
      MAIL_INBOX_URL: secret({ optional: true }),
      MEILISEARCH_URL: secret({ optional: true }),
      MEILISEARCH_KEY: secret({ optional: true }),
      RECORD_KEY_SECRET: secret({ optional: true }),
    },
  },
  vite: {
    ssr: { external: ['pg'], noExternal: ['echarts-for-react'] },
  },
});
