// Real-browser test of the HTML design-review note: loads the file in headless Chromium
// (Debian's `chromium`, driven by playwright-core; never a downloaded browser), checks that
// every chart renders with non-zero size in screen and print media, that nothing is fetched
// from the network, and saves screenshots and A4/Letter PDFs to test/browser/out/. It prints
// the demo note to PDF as a user printing from a Chromium browser would get it (no browser
// header or footer: the note's own CSS page-margin boxes carry the document number and "page
// x of y"), reads each page's text back from the PDF (./pdf-text.ts, no PDF library) and checks
// the page count and the printed page numbers; and it lays the note out at A4 width in print
// media and checks that no number, margin, result or citation cell wraps or overflows.
// Without chromium or playwright-core the test is reported as skipped with the reason.
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { ROOT, runCli } from '../helpers/cli.js';
import { pdfPageTexts } from './pdf-text.js';

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
        // Issue 16: the demo note prints on at most 10 A4 pages, each numbered "page x of N"
        // with the document number beside it. Letter is printed and numbered the same way.
        const docNumber = /<th scope="row">Document<\/th><td>([^<]+)<\/td>/.exec(r.stdout)?.[1];
        expect(docNumber).toMatch(/^SW-20240305-[0-9A-F]{4}$/);
        const pageCounts: Record<string, number> = {};
        await page.emulateMedia({ media: 'print' }); // page.pdf prints the emulated media
        for (const format of ['A4', 'Letter'] as const) {
          const pdf = join(OUT, `sawmill-note-${format}.pdf`);
          await page.pdf({ path: pdf, format, preferCSSPageSize: true });
          const bytes = readFileSync(pdf);
          expect(bytes.subarray(0, 5).toString()).toBe('%PDF-');
          const texts = pdfPageTexts(bytes);
          const n = texts.length;
          expect(n, `${format} pages`).toBe((bytes.toString('latin1').match(/\/Type\s*\/Page[^s]/g) ?? []).length);
          pageCounts[format] = n;
          texts.forEach((t, i) => {
            expect(t, `${format} page ${i + 1}`).toContain(`page ${i + 1} of ${n}`);
            expect(t, `${format} page ${i + 1}`).toContain(`${docNumber} rev. A`);
          });
          // Nothing lost: the summary on page 1, the appendix and the sign-off printed.
          expect(texts[0]).toContain('Summary and recommendation');
          expect(texts.join(' ')).toContain('Appendix: calculation sheet');
          expect(texts.join(' ')).toContain('Approved');
        }
        console.log(`[browser test] demo note pages: A4 ${pageCounts['A4']}, Letter ${pageCounts['Letter']}`);
        expect(pageCounts['A4'], 'A4 pages').toBeLessThanOrEqual(10);

        // At A4 width (210 mm less 2 × 11 mm margins = 188 mm ≈ 710 CSS px) in print media, every
        // number, margin, result and citation cell holds one line and fits its column.
        await page.setViewportSize({ width: 710, height: 1000 });
        await page.emulateMedia({ media: 'print' });
        const cells = await page.$$eval('td.num', (tds) =>
          tds.map((td) => {
            const range = document.createRange();
            range.selectNodeContents(td);
            const tops = new Set([...range.getClientRects()].map((q) => Math.round(q.top)));
            return { text: td.textContent ?? '', lines: tops.size, over: td.scrollWidth - td.clientWidth };
          }),
        );
        expect(cells.length).toBeGreaterThan(100);
        for (const c of cells) {
          expect(c.lines, `"${c.text}" lines`).toBe(1);
          expect(c.over, `"${c.text}" overflows its cell`).toBeLessThanOrEqual(1);
        }
        const wide = await page.$$eval('table', (ts) =>
          ts.filter((t) => t.scrollWidth > document.body.clientWidth + 1).map((t) => t.textContent?.slice(0, 60)),
        );
        expect(wide, 'tables wider than the page').toEqual([]);
        expect(requests).toEqual([]);
        expect(errors).toEqual([]);
      } finally {
        await browser.close();
      }
    },
    90000,
  );
});
