// After `vite build`: renders the pages listed in src/config/prebuilt.ts with react-dom/server,
// from the same components the browser runs (src/prerender.tsx), each in the state it has before
// any data has arrived, and writes each into a copy of dist/index.html (`/` → index.html,
// `/menus` → menus.html). The browser shows that markup at once and React hydrates it (main.tsx).
// The SSR bundle and the untouched template stay in server/dist (outside dist/, so never served):
// the preview server renders the same pages per request, with their data, from them
// (server/first-screen-render.ts), and falls back to the files written here.
import { createHash } from 'node:crypto';
import { readFileSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { build } from 'vite';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const dist = join(root, 'dist');
const serverDist = join(root, 'server', 'dist');

await build({
  root,
  logLevel: 'warn',
  build: {
    ssr: 'src/prerender.tsx',
    outDir: serverDist,
    emptyOutDir: true,
    copyPublicDir: false,
    minify: false,
  },
});
const { renderDocument, PREBUILT_PAGES } = await import(
  pathToFileURL(join(serverDist, 'prerender.js')).href
);

const template = readFileSync(join(dist, 'index.html'), 'utf8');
writeFileSync(join(serverDist, 'template.html'), template);

for (const page of PREBUILT_PAGES) {
  const { html, guard } = await renderDocument(template, page.path);
  writeFileSync(join(dist, page.file), html);
  const hash = createHash('sha256').update(guard).digest('base64');
  console.log(
    `prerendered ${page.path} → dist/${page.file} (${(html.length / 1024).toFixed(1)} KiB; a CSP must allow its inline script 'sha256-${hash}', also in the pages rendered per request)`,
  );
}
