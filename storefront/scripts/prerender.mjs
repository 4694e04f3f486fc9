// After `vite build`: renders the pages listed in src/config/prebuilt.ts with react-dom/server,
// from the same components the browser runs (src/prerender.tsx), each in the state it has before
// any data has arrived, and writes each into a copy of dist/index.html (`/` → index.html,
// `/menus` → menus.html). The browser shows that markup at once and React hydrates it (main.tsx).
import { createHash } from 'node:crypto';
import { readFileSync, rmSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { build } from 'vite';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const dist = join(root, 'dist');
const outDir = join(root, 'node_modules', '.prerender');

await build({
  root,
  logLevel: 'warn',
  build: { ssr: 'src/prerender.tsx', outDir, emptyOutDir: true, minify: false },
});
const { render, PREBUILT_PAGES, PREBUILT_PATH_ATTRIBUTE, OTHER_PAGE_ATTRIBUTE } = await import(
  pathToFileURL(join(outDir, 'prerender.js')).href
);

const template = readFileSync(join(dist, 'index.html'), 'utf8');
const emptyRoot = '<div id="root"></div>';
if (!template.includes(emptyRoot)) throw new Error(`dist/index.html has no ${emptyRoot}`);
if (!template.includes('</head>')) throw new Error('dist/index.html has no </head>');

for (const page of PREBUILT_PAGES) {
  let markup = await render(page.path);
  // The screen's <title> (React puts it in <head> in the browser) replaces the template's.
  const title = markup.match(/<title>.*?<\/title>/s)?.[0];
  if (title) markup = markup.replace(title, '');
  // Runs before the body is read: on any other address, the markup must not show even briefly.
  const guard = `if(location.pathname!==${JSON.stringify(page.path)})document.documentElement.setAttribute(${JSON.stringify(OTHER_PAGE_ATTRIBUTE)},'')`;
  const html = template
    .replace(/<title>.*?<\/title>/s, title ?? '$&')
    .replace(
      '</head>',
      `  <script>${guard}</script>\n    <style>[${OTHER_PAGE_ATTRIBUTE}] #root{display:none}</style>\n  </head>`,
    )
    .replace(emptyRoot, `<div id="root" ${PREBUILT_PATH_ATTRIBUTE}="${page.path}">${markup}</div>`);
  writeFileSync(join(dist, page.file), html);
  const hash = createHash('sha256').update(guard).digest('base64');
  console.log(
    `prerendered ${page.path} → dist/${page.file} (${(html.length / 1024).toFixed(1)} KiB; a CSP must allow its inline script 'sha256-${hash}')`,
  );
}
rmSync(outDir, { recursive: true, force: true });
