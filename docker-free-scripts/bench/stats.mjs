// Small statistics and child-process helpers shared by the benchmark rows.
import { execFile } from 'node:child_process';

/**
 * The p-th percentile by the nearest-rank method: the value at rank ⌈p/100 · n⌉ of the sorted
 * sample, the smallest value with at least p % of the sample at or below it. The same reading
 * autocannon's HdrHistogram gives (from memory); no interpolation, so the figure is always one
 * that was measured.
 * @param {readonly number[]} values
 * @param {number} p 0 < p ≤ 100
 */
export function percentile(values, p) {
  if (values.length === 0) return Number.NaN;
  const sorted = [...values].sort((a, b) => a - b);
  const rank = Math.min(sorted.length, Math.max(1, Math.ceil((p / 100) * sorted.length)));
  return /** @type {number} */ (sorted[rank - 1]);
}

/**
 * The median: the middle value, or the mean of the two middle values of an even sample.
 * @param {readonly number[]} values
 */
export function median(values) {
  if (values.length === 0) return Number.NaN;
  const sorted = [...values].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 === 1
    ? /** @type {number} */ (sorted[mid])
    : /** @type {number} */ (sorted[mid - 1] + /** @type {number} */ (sorted[mid])) / 2;
}

/**
 * Median, p50, p99 and max of a sample of durations.
 * @param {readonly number[]} values
 */
export function summarise(values) {
  return {
    median: median(values),
    p50: percentile(values, 50),
    p99: percentile(values, 99),
    max: values.length ? Math.max(...values) : Number.NaN,
  };
}

/**
 * Runs a node script in its own process, bounded by `timeoutMs`, and parses the JSON it prints
 * as its last line of standard output.
 * @param {string} script absolute path
 * @param {string[]} args
 * @param {{ timeoutMs: number, cwd?: string, env?: NodeJS.ProcessEnv }} options
 * @returns {Promise<any>}
 */
export function runJsonScript(script, args, { timeoutMs, cwd, env }) {
  return new Promise((resolve, reject) => {
    execFile(
      process.execPath,
      [script, ...args],
      { cwd, env: env ?? process.env, timeout: timeoutMs, maxBuffer: 16 * 2 ** 20 },
      (error, stdout, stderr) => {
        if (error) {
          reject(new Error(`${script} failed: ${error.message}\n${stderr}`));
          return;
        }
        const last = stdout.trim().split('\n').pop() ?? '';
        try {
          resolve(JSON.parse(last));
        } catch {
          reject(new Error(`${script} printed no JSON result:\n${stdout}\n${stderr}`));
        }
      },
    );
  });
}

/**
 * `promise`, or a rejection naming `what` once `ms` have passed (the timer is cleared either way).
 * @template T
 * @param {Promise<T>} promise
 * @param {number} ms
 * @param {string} what
 * @returns {Promise<T>}
 */
export async function withTimeout(promise, ms, what) {
  /** @type {NodeJS.Timeout | undefined} */
  let timer;
  try {
    return await Promise.race([
      promise,
      new Promise((_, reject) => {
        timer = setTimeout(() => reject(new Error(`${what} took over ${ms / 1000} s`)), ms);
      }),
    ]);
  } finally {
    clearTimeout(timer);
  }
}

/**
 * `fetch` for an idempotent request, tried again (up to `attempts` times) when the connection
 * fails: a kept-alive socket the server closes just as it is reused ends in "other side closed".
 * @param {string} url
 * @param {RequestInit} [init]
 * @param {number} [attempts]
 * @returns {Promise<Response>}
 */
export async function fetchIdempotent(url, init = {}, attempts = 3) {
  for (let attempt = 1; ; attempt += 1) {
    try {
      return await fetch(url, init);
    } catch (error) {
      if (attempt >= attempts || init.signal?.aborted) throw error;
      await new Promise((r) => setTimeout(r, 100 * attempt));
    }
  }
}
