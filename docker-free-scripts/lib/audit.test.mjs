import { describe, expect, it } from 'vitest';
import { readAudit } from './audit.mjs';

// Reports in the shape `npm audit --json` prints (npm 7+, "auditReportVersion": 2: a
// `vulnerabilities` map by package and `metadata.vulnerabilities` counts). The advisories are
// real GitHub advisories, their ids and titles from memory.
const semverModerate = {
  name: 'semver',
  severity: 'moderate',
  isDirect: false,
  via: [
    {
      source: 1096482,
      name: 'semver',
      dependency: 'semver',
      title: 'semver vulnerable to Regular Expression Denial of Service',
      url: 'https://github.com/advisories/GHSA-c2qf-rxjj-qqgw',
      severity: 'moderate',
      range: '>=7.0.0 <7.5.2',
    },
  ],
  effects: [],
  range: '7.0.0 - 7.5.1',
  nodes: ['node_modules/semver'],
  fixAvailable: true,
};
const minimistCritical = {
  name: 'minimist',
  severity: 'critical',
  isDirect: false,
  via: [
    {
      source: 1097677,
      name: 'minimist',
      dependency: 'minimist',
      title: 'Prototype Pollution in minimist',
      url: 'https://github.com/advisories/GHSA-xvch-5gv4-984h',
      severity: 'critical',
      range: '<0.2.4',
    },
  ],
  effects: ['mkdirp'],
  range: '<0.2.4',
  nodes: ['node_modules/minimist'],
  fixAvailable: { name: 'mkdirp', version: '3.0.1', isSemVerMajor: true },
};
const mkdirpThrough = {
  name: 'mkdirp',
  severity: 'critical',
  isDirect: true,
  via: ['minimist'],
  effects: [],
  range: '0.4.1 - 0.5.1',
  nodes: ['node_modules/mkdirp'],
  fixAvailable: { name: 'mkdirp', version: '3.0.1', isSemVerMajor: true },
};

const report = (vulnerabilities, counts) =>
  JSON.stringify({
    auditReportVersion: 2,
    vulnerabilities,
    metadata: {
      vulnerabilities: { info: 0, low: 0, moderate: 0, high: 0, critical: 0, ...counts },
      dependencies: { prod: 412, dev: 0, optional: 3, peer: 0, peerOptional: 0, total: 412 },
    },
  });

describe('reading npm audit --json', () => {
  it('passes a clean report', () => {
    expect(readAudit(report({}, {}))).toEqual({
      verdict: 'pass',
      counts: { info: 0, low: 0, moderate: 0, high: 0, critical: 0 },
      findings: [],
    });
  });

  it('passes a moderate advisory at level high, fails it at level moderate', () => {
    const text = report({ semver: semverModerate }, { moderate: 1, total: 1 });
    expect(readAudit(text, 'high').verdict).toBe('pass');
    const strict = readAudit(text, 'moderate');
    expect(strict.verdict).toBe('fail');
    expect(strict.findings).toEqual([
      {
        name: 'semver',
        severity: 'moderate',
        title:
          'semver vulnerable to Regular Expression Denial of Service (https://github.com/advisories/GHSA-c2qf-rxjj-qqgw)',
        fix: 'npm audit fix',
      },
    ]);
  });

  it('fails on critical advisories, worst first, naming the fix and the package it comes through', () => {
    const result = readAudit(
      report(
        { semver: semverModerate, minimist: minimistCritical, mkdirp: mkdirpThrough },
        { moderate: 1, critical: 2 },
      ),
    );
    expect(result.verdict).toBe('fail');
    expect(result.findings.map((f) => [f.name, f.severity, f.fix])).toEqual([
      ['minimist', 'critical', 'mkdirp@3.0.1 (major)'],
      ['mkdirp', 'critical', 'mkdirp@3.0.1 (major)'],
    ]);
    expect(result.findings[1].title).toBe('through minimist');
    expect(result.counts.critical).toBe(2);
  });

  it('gives no verdict when the advisory service cannot be reached', () => {
    // What this machine's registry answers: 405 on the bulk advisory endpoint.
    const text = JSON.stringify({
      message:
        '405 Method Not Allowed - POST https://registry.npmjs.org/-/npm/v1/security/advisories/bulk',
      method: 'POST',
      statusCode: 405,
      body: '',
      error: { summary: '', detail: '' },
    });
    const result = readAudit(text);
    expect(result.verdict).toBe('unavailable');
    expect(result.reason).toMatch(/^the advisory service answered 405: 405 Method Not Allowed/);
    expect(readAudit('npm ERR! network', 'high').verdict).toBe('unavailable');
  });

  it('refuses an unknown level', () => {
    expect(() => readAudit(report({}, {}), 'severe')).toThrow(/Unknown audit level “severe”/);
  });
});
