#!/usr/bin/env node
// CI's dependency audit: `npm audit --omit=dev --audit-level=high` over the runtime packages.
// Exit 1 on a high or critical advisory. When the advisory service cannot be reached (some
// mirrors answer 405), say so and go on, unless NAPPE_AUDIT_REQUIRED=1.
import { spawnSync } from 'node:child_process';
import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { readAudit } from './lib/audit.mjs';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '..');
const level = process.env.NAPPE_AUDIT_LEVEL ?? 'high';
const run = spawnSync('npm', ['audit', '--omit=dev', `--audit-level=${level}`, '--json'], {
  cwd: root,
  encoding: 'utf8',
  timeout: 120_000,
});
const result = readAudit(run.stdout ?? '', level);

if (result.verdict === 'unavailable') {
  const required = process.env.NAPPE_AUDIT_REQUIRED === '1';
  console.log(
    `npm audit: no verdict — ${result.reason}.${required ? '' : ' Going on (set NAPPE_AUDIT_REQUIRED=1 to fail here).'}`,
  );
  process.exit(required ? 1 : 0);
}
const summary = Object.entries(result.counts)
  .map(([s, n]) => `${n} ${s}`)
  .join(', ');
if (result.verdict === 'fail') {
  console.error(
    `npm audit: ${result.findings.length} runtime package(s) at ${level} or above (${summary}):`,
  );
  for (const f of result.findings)
    console.error(`  ${f.severity.padEnd(8)} ${f.name}: ${f.title} — fix: ${f.fix}`);
  process.exit(1);
}
console.log(`npm audit: nothing at ${level} or above in the runtime packages (${summary}).`);
