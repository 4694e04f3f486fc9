// The benchmark's measuring instruments, checked against the published definitions they claim.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { chromium } from 'playwright-core';
import { CHROMIUM_ARGS, clsOf, interactionOf, vitalsObserver } from './page-vitals.mjs';
import { median, percentile } from './stats.mjs';

describe('percentile and median', () => {
  it('nearest rank, as in the worked example of the method (Wikipedia, "Percentile", from memory)', () => {
    const sample = [15, 20, 35, 40, 50];
    expect(percentile(sample, 5)).toBe(15);
    expect(percentile(sample, 30)).toBe(20);
    expect(percentile(sample, 40)).toBe(20);
    expect(percentile(sample, 50)).toBe(35);
    expect(percentile(sample, 100)).toBe(50);
    // Order of the input does not matter.
    expect(percentile([50, 15, 40, 20, 35], 50)).toBe(35);
  });

  it('median: the middle value, or the mean of the two middle ones', () => {
    expect(median([3, 1, 2])).toBe(2);
    expect(median([4, 1, 3, 2])).toBe(2.5);
    expect(median([])).toBeNaN();
  });
});

describe('CLS session windows (web.dev, "Cumulative Layout Shift (CLS)": a window ends at a 1 s gap or after 5 s; CLS is the largest window)', () => {
  it('adds the shifts of one burst', () => {
    expect(
      clsOf([
        { startTime: 100, value: 0.05 },
        { startTime: 600, value: 0.04 },
      ]),
    ).toBeCloseTo(0.09, 10);
  });

  it('takes the largest burst, not the sum, when bursts are 1 s or more apart', () => {
    expect(
      clsOf([
        { startTime: 0, value: 0.05 },
        { startTime: 1000, value: 0.02 }, // exactly 1 s later: a new window
        { startTime: 3000, value: 0.03 },
        { startTime: 3500, value: 0.03 },
      ]),
    ).toBeCloseTo(0.06, 10);
  });

  it('closes a window after 5 s even when shifts keep coming', () => {
    // A shift of 0.01 every 0.5 s for 8 s (17 shifts): windows of 10 shifts (0 to 4.5 s), then 7.
    const shifts = Array.from({ length: 17 }, (_, i) => ({ startTime: i * 500, value: 0.01 }));
    expect(clsOf(shifts)).toBeCloseTo(0.1, 10);
  });

  it('is 0 without shifts', () => {
    expect(clsOf([])).toBe(0);
  });
});

describe('interaction', () => {
  it('is the longest entry, or null when none arrived', () => {
    expect(interactionOf([{ duration: 24 }, { duration: 96 }, { duration: 40 }])).toBe(96);
    expect(interactionOf([])).toBeNull();
  });
});

// A page whose layout shift follows from the score formula: score = impact fraction × distance
// fraction (web.dev, "Cumulative Layout Shift (CLS)", "Layout shift score"). In a 400 × 800
// viewport a full-width block 400 px tall moves down 200 px: the union of its two positions
// covers 600 of 800 rows (impact 0.75), it moved 200 px of the viewport's larger side 800
// (distance 0.25): 0.1875. A second shift made by a click handler has recent input and does not
// count. The click handler keeps the main thread busy for 120 ms, so the interaction lasts at
// least that long.
const PAGE = `<!doctype html>
<html><head><meta name="viewport" content="width=device-width, initial-scale=1"></head>
<body style="margin:0;overflow:hidden">
  <div id="spacer" style="height:0"></div>
  <div id="block" style="width:400px;height:400px;background:#a3324a"></div>
  <h1 style="position:absolute;top:680px;left:0;margin:0;font:32px sans-serif">The largest text on this page</h1>
  <script>
    setTimeout(() => { document.getElementById('spacer').style.height = '200px'; }, 300);
    document.getElementById('block').addEventListener('click', () => {
      const until = performance.now() + 120;
      while (performance.now() < until) {}
      document.getElementById('spacer').style.height = '300px';
    });
  </script>
</body></html>`;

describe('the in-page observer in Chromium', () => {
  /** @type {import('playwright-core').Browser} */
  let browser;
  beforeAll(async () => {
    browser = await chromium.launch({ executablePath: '/usr/bin/chromium', args: CHROMIUM_ARGS });
  }, 60_000);
  afterAll(async () => {
    await browser?.close();
  });

  it('reports the layout shift the formula gives, leaves out the one after input, and times the click', async () => {
    const context = await browser.newContext({ viewport: { width: 400, height: 800 } });
    try {
      const page = await context.newPage();
      await page.route('http://vitals.test/', (route) =>
        route.fulfill({ body: PAGE, contentType: 'text/html' }),
      );
      await page.addInitScript(vitalsObserver);
      await page.goto('http://vitals.test/');
      await page.waitForFunction(
        () => /** @type {any} */ (globalThis).__nappeVitals.shifts.length > 0,
      );
      await page.waitForTimeout(500);
      await page.click('#block', { position: { x: 200, y: 300 } });
      await page.waitForTimeout(1000);
      const vitals = await page.evaluate(() => /** @type {any} */ (globalThis).__nappeVitals);
      expect(vitals.shifts).toHaveLength(1);
      expect(clsOf(vitals.shifts)).toBeCloseTo(0.1875, 3);
      expect(vitals.lcp.at(-1).element).toBe('h1 “The largest text on this page”');
      const interaction = interactionOf(vitals.events);
      // Event durations are rounded to 8 ms (Event Timing, W3C); the busy handler alone is 120.
      expect(interaction).toBeGreaterThanOrEqual(112);
      expect(interaction).toBeLessThan(2000);
    } finally {
      await context.close();
    }
  }, 60_000);
});
