// `npm audit --omit=dev --audit-level=high`, read as JSON so that three outcomes are told apart:
// advisories at or above the level (fail), none (pass), and an advisory service that cannot be
// reached (no verdict: said plainly, and a failure only when NAPPE_AUDIT_REQUIRED=1).

export const SEVERITIES = ['info', 'low', 'moderate', 'high', 'critical'];

/**
 * Reads the JSON `npm audit --json` printed (npm 7+, audit report version 2).
 * @param {string} stdout
 * @param {string} [level] the lowest severity that fails, default `high`
 * @returns {{ verdict: 'pass' | 'fail' | 'unavailable', counts: Record<string, number>, findings: Array<{ name: string, severity: string, title: string, fix: string }>, reason?: string }}
 */
export function readAudit(stdout, level = 'high') {
  const floor = SEVERITIES.indexOf(level);
  if (floor < 0)
    throw new Error(`Unknown audit level “${level}”: one of ${SEVERITIES.join(', ')}.`);
  let report;
  try {
    report = JSON.parse(stdout);
  } catch {
    return {
      verdict: 'unavailable',
      counts: {},
      findings: [],
      reason: 'npm audit printed no JSON',
    };
  }
  if (!report || typeof report !== 'object') {
    return {
      verdict: 'unavailable',
      counts: {},
      findings: [],
      reason: 'npm audit printed no report',
    };
  }
  if (!report.vulnerabilities || !report.metadata) {
    const status = report.statusCode ?? report.error?.code ?? 'error';
    const message = String(report.message ?? report.error?.summary ?? 'no report');
    return {
      verdict: 'unavailable',
      counts: {},
      findings: [],
      reason: `the advisory service answered ${status}: ${message}`,
    };
  }
  const counts = Object.fromEntries(
    SEVERITIES.map((s) => [s, Number(report.metadata.vulnerabilities?.[s] ?? 0)]),
  );
  /** @typedef {{ title?: string, url?: string }} Advisory */
  /** @typedef {{ name: string, severity: string, via?: Array<string | Advisory>, fixAvailable?: boolean | { name: string, version: string, isSemVerMajor?: boolean } }} Vulnerability */
  const vulnerabilities = /** @type {Vulnerability[]} */ (Object.values(report.vulnerabilities));
  const findings = vulnerabilities
    .filter((v) => SEVERITIES.indexOf(v.severity) >= floor)
    .map((v) => ({
      name: v.name,
      severity: v.severity,
      title:
        (v.via ?? [])
          .filter(/** @returns {x is Advisory} */ (x) => typeof x === 'object' && x !== null)
          .map((x) => `${x.title ?? 'advisory'}${x.url ? ` (${x.url})` : ''}`)
          .join('; ') || `through ${(v.via ?? []).join(', ')}`,
      fix:
        v.fixAvailable === true
          ? 'npm audit fix'
          : v.fixAvailable && typeof v.fixAvailable === 'object'
            ? `${v.fixAvailable.name}@${v.fixAvailable.version}${v.fixAvailable.isSemVerMajor ? ' (major)' : ''}`
            : 'no fix published',
    }))
    .sort(
      (a, b) =>
        SEVERITIES.indexOf(b.severity) - SEVERITIES.indexOf(a.severity) ||
        a.name.localeCompare(b.name),
    );
  return { verdict: findings.length > 0 ? 'fail' : 'pass', counts, findings };
}
