/**
 * `check --report FILE.html`: a self-contained page (no script, no network), every
 * claim with a mark and a word, coefficient grids with the first mismatch marked.
 * The page is also loaded in headless Chromium (Debian's `chromium`, driven by
 * playwright-core): no console errors, no request leaves the file, the first mismatch
 * is marked, and screenshots go to test/artifacts/ (git-ignored).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdirSync, mkdtempSync, readFileSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { pathToFileURL } from 'node:url';
import { chromium } from 'playwright-core';
import { htmlReport } from '../../src/report/index.js';
import { cli } from '../helpers/cli.js';
import { systemTool } from '../helpers/system-tool.js';
import { PROVED, REFUTED, BY_TYPE, ERROR, UNPROVED, SOURCE } from './fixtures.js';

const CHROMIUM = '/usr/bin/chromium';
const browser = systemTool(CHROMIUM, 'chromium');
const ARTIFACTS = resolve('test/artifacts');
const PATHS = ['test/cases/check/example-from-claims-md.claim', 'test/cases/check/meromorphic-cross-multiplied.claim', 'test/cases/check/ill-typed-sum.claim', 'test/cases/report'];

let dir = '';
let page = '';
let html = '';
beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'sturmcheck-html-'));
  page = join(dir, 'report.html');
  const r = await cli('check', '--report', page, ...PATHS);
  expect(r.code).toBe(1); // ill-typed-sum has an error that is not expected
  html = readFileSync(page, 'utf8');
});
afterAll(() => {
  rmSync(dir, { recursive: true, force: true });
});

describe('html report: the page', () => {
  it('is self-contained: inline style, no script, no external resource, a print stylesheet', () => {
    expect(html).toMatch(/^<!DOCTYPE html>/);
    expect(html).not.toMatch(/<script|<link|<img|<iframe|@import|url\(/i);
    expect(html).not.toMatch(/(https?:)?\/\/[a-z]/i);
    expect(html).toContain('@media print');
  });

  it('gives every verdict a mark and a word, not colour alone', () => {
    const text = htmlReport({ verdicts: [PROVED, REFUTED, BY_TYPE, ERROR, UNPROVED], sources: new Map([['x.claim', SOURCE]]), toolVersion: '1' });
    for (const [mark, word] of [['✓', 'proved'], ['✗', 'refuted'], ['?', 'unproved'], ['!', 'error']]) {
      expect(text).toContain(`<span class="mark">${mark}</span><span class="word">${word}</span>`);
    }
    expect(text).toContain('⚠ not as expected');
  });

  it('escapes claim names and texts', () => {
    const text = htmlReport({ verdicts: [{ ...PROVED, name: '<b>bold</b> & co', claimText: 'claim "<i>": E_4 == E_4' }], sources: new Map(), toolVersion: '1' });
    expect(text).toContain('&lt;b&gt;bold&lt;/b&gt; &amp; co');
    expect(text).not.toContain('<b>bold');
  });

  it('marks the first mismatch of a refuted claim in the left, right and difference grids', () => {
    const card = html.slice(html.indexOf('<span class="name">a wrong constant, kept as a negative example</span>'));
    const first = card.slice(0, card.indexOf('</article>'));
    // Delta·phi_{-2,1} = q(ζ^-1 − 2 + ζ) + O(q²) (Eichler–Zagier, Theorem 9.3, with Δ = q + O(q²)),
    // against 144/143 of it: the first mismatch is at q^1 ζ^0, left −2, right −288/143.
    expect(first.match(/data-first-mismatch="true"/g)).toHaveLength(3);
    expect(first).toMatch(/data-first-mismatch="true" title="first mismatch">-2</);
    expect(first).toMatch(/data-first-mismatch="true" title="first mismatch">-288\/143</);
    expect(first).toMatch(/data-first-mismatch="true" title="first mismatch">2\/143</);
  });

  it('shows the bound and the compared region of a proved claim, and says when a grid is capped', () => {
    // Theorem A (MATH.md §6) for weight 10, index 1: (10 + 2)/12 = 1.
    expect(html).toContain('(K + 2m)/12 with K = 10, m = 1: q-order 1');
    expect(html).toContain('compared region: both sides agree');
    // E_4^27 = 1 + 240·27 q + … has positive coefficients at every q^n (E_4's are 240σ_3(n) > 0,
    // Zagier, "Elliptic modular forms and their applications", §2.1), so the bound q^9 (108/12) has
    // ten non-zero rows; the window shows eight.
    expect(html).toContain('Showing 8 of 10 q-exponents');
    // φ_{0,1}^6 reaches ζ^±8 at q^2 (each factor has |r| ≤ 1 at q^0, ≤ 2 at q^1, ≤ 3 at q^2: the
    // expansion in Eichler–Zagier, Theorem 9.3), so 17 columns −8…8; the window shows thirteen.
    expect(html).toContain('13 of 17 ζ-exponents');
    expect(html).toContain('the window is capped to stay readable');
  });

  it('is written atomically: the old file is replaced, no temporary file remains', async () => {
    const out = join(dir, 'again');
    mkdirSync(out);
    writeFileSync(join(out, 'r.html'), 'old');
    await cli('check', '--report', join(out, 'r.html'), PATHS[0]!);
    expect(readFileSync(join(out, 'r.html'), 'utf8')).toMatch(/^<!DOCTYPE html>/);
    expect(readdirSync(out)).toEqual(['r.html']);
  });

  it('an unwritable report path is exit 2', async () => {
    const r = await cli('check', '--report', join(dir, 'missing', 'r.html'), PATHS[0]!);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('cannot write');
  });
});

describe.runIf(browser.run)('html report in headless Chromium', () => {
  it('loads with no console error and no request, marks the first mismatch, and is screenshotted', async () => {
    const profile = mkdtempSync(join(tmpdir(), 'sturmcheck-chromium-'));
    const context = await chromium.launchPersistentContext(profile, {
      executablePath: CHROMIUM,
      headless: true,
      args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
      viewport: { width: 1200, height: 900 },
    });
    try {
      const tab = await context.newPage();
      const problems: string[] = [];
      tab.on('console', (m) => {
        if (m.type() === 'error') problems.push(m.text());
      });
      tab.on('pageerror', (e) => problems.push(e.message));
      const requests: string[] = [];
      await tab.route('**/*', async (route) => {
        const url = route.request().url();
        if (url.startsWith('file:')) return route.continue();
        requests.push(url);
        return route.abort();
      });
      await tab.goto(pathToFileURL(page).href);
      expect(problems).toEqual([]);
      expect(requests).toEqual([]);
      const card = tab.locator('article', { hasText: 'a wrong constant, kept as a negative example' });
      const marked = card.locator('table[data-part="difference"] td[data-first-mismatch]');
      await expect(marked.count()).resolves.toBe(1);
      const look = await marked.evaluate((el) => {
        // Runs in the page; the test's TypeScript has no DOM library, so the one call is typed here.
        const { getComputedStyle: style } = globalThis as unknown as { getComputedStyle: (e: unknown, pseudo?: string) => { borderTopWidth: string; content: string } };
        return { border: parseFloat(style(el).borderTopWidth), star: style(el, '::before').content, text: el.textContent };
      });
      expect(look.border).toBeGreaterThanOrEqual(3);
      expect(look.star).toContain('★');
      expect(look.text).toBe('2/143');
      mkdirSync(ARTIFACTS, { recursive: true });
      await tab.screenshot({ path: join(ARTIFACTS, 'html-report-top.png') });
      await card.screenshot({ path: join(ARTIFACTS, 'html-report-refuted.png') });
      await tab.emulateMedia({ media: 'print' });
      await card.screenshot({ path: join(ARTIFACTS, 'html-report-refuted-print.png') });
      expect(readdirSync(ARTIFACTS)).toEqual(expect.arrayContaining(['html-report-top.png', 'html-report-refuted.png', 'html-report-refuted-print.png']));
    } finally {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
    }
  }, 60_000);
});
