import react from '@vitejs/plugin-react';
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { defaultClientConditions } from 'vite';
import { defineConfig } from 'vitest/config';
import { firstScreenRender } from './server/first-screen-render.js';

const apiProxy = {
  '/api': { target: process.env.API_URL ?? 'http://localhost:3000' },
};

/** Chakra's theme modules (see src/theme/index.ts for why they are imported one by one). */
const chakraTheme = fileURLToPath(
  new URL('../node_modules/@chakra-ui/react/dist/esm/theme/', import.meta.url),
);
/**
 * React Router ships a production build beside its development one, but its package.json points
 * every import at the development build, dev-only warnings included (remix-run/react-router
 * issues #12532 and #14102, "intended to be temporary"): production bundles take the other.
 */
const reactRouterProduction = fileURLToPath(
  new URL('../node_modules/react-router/dist/production/index.mjs', import.meta.url),
);
for (const path of [chakraTheme, reactRouterProduction]) {
  if (!existsSync(path)) throw new Error(`${path} is missing: update the aliases below.`);
}

/**
 * What Home, Menus and a menu's page show of the menus (cards, facts, allergens, photos, loading
 * shapes, and the Chakra parts they are built from): one chunk rather than a dozen shared
 * fragments, which on HTTP/1.1 (six connections) would take several round trips to arrive.
 */
const MENUS_UI = new RegExp(
  [
    String.raw`[\\/]src[\\/]features[\\/]menus[\\/]components[\\/]`,
    String.raw`[\\/]src[\\/]components[\\/]ui[\\/](allergen-icons|booking-icons|icons|photo|plate-illustration|query-state|skeleton|text-link)\.tsx?$`,
    String.raw`[\\/]src[\\/]lib[\\/]format\.ts$`,
    String.raw`[\\/]@chakra-ui[\\/]react[\\/]dist[\\/]esm[\\/]components[\\/](alert|card|empty-state|grid|list|simple-grid|skeleton)[\\/]`,
  ].join('|'),
);

export default defineConfig(({ command }) => ({
  plugins: [react(), firstScreenRender()],
  resolve: {
    // Read @nappe/shared from its TypeScript source: no prior build of shared is needed.
    conditions: ['@nappe/source', ...defaultClientConditions],
    // npm installs @hookform/resolvers again under web-kit/node_modules: resolved from here, it is
    // bundled once. It is the only one of web-kit's peers installed twice: adding the others here
    // changes no byte of the build.
    dedupe: ['@hookform/resolvers'],
    alias: [
      { find: /^@chakra-ui\/react\/theme\/(.+)$/, replacement: `${chakraTheme}$1.js` },
      ...(command === 'build'
        ? [{ find: /^react-router$/, replacement: reactRouterProduction }]
        : []),
    ],
  },
  ssr: {
    // The build-time render (scripts/prerender.mjs) reads the same sources as the browser.
    resolve: { conditions: ['@nappe/source'] },
  },
  build: {
    // Every browser the storefront supports knows <link rel="modulepreload"> (Baseline since
    // 2023): Vite's polyfill for it would only be startup JavaScript nobody runs.
    modulePreload: { polyfill: false },
    rolldownOptions: {
      output: {
        // The entry lists the file of every screen's chunk (to fetch a screen's chunks together):
        // names of hash alone keep that list, startup JavaScript, about half as long.
        chunkFileNames: 'assets/[hash].js',
        // Everything the first page needs before its screen, in one file: fewer round trips
        // than the dozen small shared chunks automatic splitting makes of it, and it compresses
        // better as one. The screens stay in their own chunks.
        codeSplitting: {
          groups: [
            { name: 'app', tags: ['$initial'] },
            { name: 'menus-ui', test: MENUS_UI },
            // The parts lists of Chakra's and Ark's components, which recipes and screens share:
            // one small chunk rather than one per component.
            { name: 'anatomy', test: /[\\/](create-anatomy|[\w-]+\.anatomy)\.m?js$/ },
          ],
        },
      },
      treeshake: {
        moduleSideEffects: [
          // @nappe/shared is pure TypeScript with no import-time side effects (STYLE.md), but its
          // package.json cannot say so to a bundler reading its source: without this, importing
          // one schema would carry the whole kitchen library (demo catalogue, mix balance…) along.
          { test: /[\\/]shared[\\/]src[\\/]/, sideEffects: false },
          // The same for @nappe/web-kit: its entry points re-export every module, and the entry
          // imports @nappe/web-kit/auth for the query keys; said so, the forgot/reset forms, zod
          // and react-hook-form stay in the lazy screens that use them.
          { test: /[\\/]web-kit[\\/]src[\\/]/, sideEffects: false },
          // CommonJS that only defines functions, which only Emotion's withTheme (unused here)
          // calls: said so, the bundler leaves them out instead of running them at startup.
          {
            test: /[\\/]node_modules[\\/](hoist-non-react-statics|react-is)[\\/]/,
            sideEffects: false,
          },
        ],
      },
    },
  },
  server: { port: 5173, strictPort: true, proxy: apiProxy },
  preview: { port: 5173, strictPort: true, proxy: apiProxy },
  test: {
    environment: 'jsdom',
    include: ['src/**/*.test.{ts,tsx}'],
    setupFiles: ['./src/testing/setup.ts'],
    // Whole routes with lazy chunks, on a busy 2-core machine: role queries over a month grid
    // take a few seconds, well past vitest's 5 s default.
    testTimeout: 20_000,
    css: false,
  },
}));
