// Real-browser test of the HTML design-review note: loads the file in headless Chromium
// (Debian's `chromium`, driven by playwright-core; never a downloaded browser), checks that
// every chart renders with non-zero size in screen and print media, that nothing is fetched
// from the network, and saves screenshots and A4/Letter PDFs to test/browser/out/.
// Without chromium or playwright-core the test is reported as skipped with the reason.
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { ROOT, runCli } from '../helpers/cli.js';

// SHAFTWISE_CHROMIUM only points the test elsewhere (e.g. a missing path, to see the skip).
const CHROMIUM = process.env['SHAFTWISE_CHROMIUM'] ?? '/usr/bin/chromium';
const ARGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--no-first-run',
];
const OUT = join(ROOT, 'test/browser/out');
const CHARTS = ['bushing-wear', 'rolling-life', 'journal-film', 'journal-temperature', 'journal-pressure'];

function missing(): string | null {
  if (!existsSync(CHROMIUM)) return `no browser at ${CHROMIUM} (install it with: apt-get install -y chromium)`;
  try {
    createRequire(import.meta.url).resolve('playwright-core');
  } catch {
    return 'playwright-core is not installed (npm install --no-save playwright-core@1.65.1)';
  }
  return null;
}
const why = missing();
if (why) console.warn(`[browser test skipped] ${why}`);

describe('HTML note in a real browser', () => {
  it.skipIf(why !== null)(
    `renders every chart with a non-zero box, fetches nothing, prints to A4 and Letter${why ? ` (skipped: ${why})` : ''}`,
    async () => {
      mkdirSync(OUT, { recursive: true });
      const file = join(OUT, 'sawmill-note.html');
      const r = runCli(['advise', 'examples/sawmill-infeed-roller.yaml', '--format', 'html'], {
        env: { SOURCE_DATE_EPOCH: '1709640000' },
      });
      expect(r.code).toBe(0);
      writeFileSync(file, r.stdout);

      const name = 'playwright-core';
      const { chromium } = (await import(name)) as typeof import('playwright-core');
      const browser = await chromium.launch({ executablePath: CHROMIUM, args: ARGS });
      try {
        const page = await browser.newPage({ viewport: { width: 1100, height: 900 } });
        const requests: string[] = [];
        page.on('request', (q) => {
          if (!q.url().startsWith('file://')) requests.push(q.url());
        });
        const errors: string[] = [];
        page.on('pageerror', (e) => errors.push(e.message));
        await page.goto(`file://${file}`, { waitUntil: 'load' });

        const boxes = async () =>
          page.$$eval('svg.chart', (els) =>
            els.map((svg) => {
              const box = svg.getBoundingClientRect();
              const lines = [...svg.querySelectorAll('path.series')].map((p) => (p as SVGGraphicsElement).getBBox());
              const ticks = svg.querySelectorAll('.ticks text').length;
              return {
                id: svg.id,
                w: box.width,
                h: box.height,
                lines: lines.map((b) => b.width * b.height + b.width + b.height),
                ticks,
                legend: svg.querySelectorAll('.legend text').length,
              };
            }),
          );
        for (const media of ['screen', 'print'] as const) {
          await page.emulateMedia({ media });
          const seen = await boxes();
          expect(seen.map((b) => b.id).sort(), media).toEqual(CHARTS.map((c) => `chart-${c}`).sort());
          for (const b of seen) {
            expect(b.w, `${b.id} width (${media})`).toBeGreaterThan(200);
            expect(b.h, `${b.id} height (${media})`).toBeGreaterThan(100);
            expect(b.lines.length, `${b.id} series`).toBeGreaterThan(0);
            for (const l of b.lines) expect(l, `${b.id} series box`).toBeGreaterThan(0);
            expect(b.ticks, `${b.id} tick labels`).toBeGreaterThanOrEqual(6);
            expect(b.legend, `${b.id} legend entries`).toBeGreaterThanOrEqual(2);
          }
        }
        await page.emulateMedia({ media: 'screen' });
        await page.screenshot({ path: join(OUT, 'sawmill-note.png'), fullPage: true });
        for (const c of CHARTS) await page.locator(`#chart-${c}`).screenshot({ path: join(OUT, `chart-${c}.png`) });
        for (const format of ['A4', 'Letter'] as const) {
          const pdf = join(OUT, `sawmill-note-${format}.pdf`);
          await page.pdf({ path: pdf, format, preferCSSPageSize: true });
          const bytes = readFileSync(pdf);
          expect(bytes.subarray(0, 5).toString()).toBe('%PDF-');
          expect(
            (bytes.toString('latin1').match(/\/Type\s*\/Page[^s]/g) ?? []).length,
            `${format} pages`,
          ).toBeGreaterThan(3);
        }
        expect(requests).toEqual([]);
        expect(errors).toEqual([]);
      } finally {
        await browser.close();
      }
    },
    60000,
  );
});
