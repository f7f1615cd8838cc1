/**
 * dist/functions.js in headless Chromium, as Excel on the web and on Mac runs it in a browser
 * runtime. dist/ is served on 127.0.0.1 by a small server inside the test; the page defines the
 * CustomFunctions stand-in, then loads the bundle. Every request the page makes is recorded: the
 * bundle must ask for nothing beyond the test server.
 *
 * Uses Debian's /usr/bin/chromium (never a downloaded browser). Missing in CI it fails; missing
 * on a developer's machine it is skipped with a message (apt-get install chromium).
 */
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import { extname, join, normalize, sep } from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CHROMIUM, CHROMIUM_ARGS, haveChromium as isChromiumInstalled } from '../../scripts/chromium';
import { answersAsTheAdapter, distDir, readDist, STAND_IN, type Call } from './bundle-harness';

const inCI = Boolean(process.env.CI) && process.env.CI !== 'false';
const haveChromium = isChromiumInstalled();
if (!haveChromium && !inCI) {
  console.warn(`bundle-chromium: skipped, ${CHROMIUM} is missing (apt-get install chromium to run it; in CI it fails instead)`);
}

const TEST_PAGE = `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><title>Fluxbook bundle test</title>
<link rel="icon" href="data:,">
<script>${STAND_IN}</script>
<script src="/functions.js"></script>
</head><body></body></html>`;

const TYPES: Record<string, string> = { '.js': 'text/javascript', '.json': 'application/json', '.html': 'text/html', '.png': 'image/png' };

/** Serves the test page at / and the files of dist/ below it; nothing else. */
function serveDist(): Promise<Server> {
  const server = createServer((req, res) => {
    const path = decodeURIComponent(new URL(req.url ?? '/', 'http://127.0.0.1').pathname);
    if (path === '/') {
      res.writeHead(200, { 'content-type': 'text/html; charset=utf-8' }).end(TEST_PAGE);
      return;
    }
    const file = normalize(join(distDir, path));
    try {
      if (!file.startsWith(distDir + sep)) throw new Error('outside dist');
      const body = readFileSync(file);
      res.writeHead(200, { 'content-type': TYPES[extname(file)] ?? 'application/octet-stream' }).end(body);
    } catch {
      res.writeHead(404).end();
    }
  });
  return new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => resolve(server));
  });
}

// Its own test, so a CI run without Chromium counts a failure rather than only skipped tests.
it.skipIf(!haveChromium && !inCI)(`finds Debian Chromium at ${CHROMIUM}`, () => {
  expect(haveChromium, `${CHROMIUM} is missing: CI must install Debian's chromium (.ci/run does)`).toBe(true);
});

describe.skipIf(!haveChromium && !inCI)('dist/functions.js in headless Chromium', () => {
  let server: Server | undefined;
  let origin = '';
  let userDataDir = '';
  let browser: BrowserContext | undefined;
  let page: Page;
  const requests: string[] = [];
  const pageErrors: string[] = [];

  async function run(calls: readonly Call[]): Promise<unknown[]> {
    const json = JSON.stringify(calls.map(({ id, args }) => ({ id, args })));
    const out = await page.evaluate((j) => (globalThis as any).__fluxbook.callAll(j) as string, json);
    return JSON.parse(out) as unknown[];
  }

  // Chromium's V8 and Node's round Math.exp, Math.log and Math.pow differently in the last bit
  // for about one argument in ten, so a number may differ from Node's by a few units in the last
  // place; everything else must be equal.
  function sameResult(got: unknown, want: unknown): boolean {
    if (Array.isArray(got) && Array.isArray(want)) return got.length === want.length && got.every((g, i) => sameResult(g, want[i]));
    if (typeof got === 'number' && typeof want === 'number') return got === want || Math.abs(got - want) <= 1e-12 * Math.max(1, Math.abs(want));
    return JSON.stringify(got) === JSON.stringify(want);
  }

  beforeAll(async () => {
    if (!haveChromium) throw new Error(`${CHROMIUM} is missing: CI must install Debian's chromium (.ci/run does when [ -x ${CHROMIUM} ] fails)`);
    readDist('functions.js'); // fail first, and clearly, when the build has not run
    server = await serveDist();
    origin = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
    userDataDir = mkdtempSync(join(tmpdir(), 'fluxbook-chromium-'));
    browser = await chromium.launchPersistentContext(userDataDir, {
      executablePath: CHROMIUM,
      headless: true,
      args: CHROMIUM_ARGS,
      timeout: 30_000,
    });
    browser.on('request', (r) => requests.push(r.url()));
    // Record, then refuse, anything bound elsewhere: the test itself must not reach outside.
    await browser.route('**/*', (route) => (new URL(route.request().url()).origin === origin ? route.continue() : route.abort()));
    page = browser.pages()[0] ?? (await browser.newPage());
    page.on('pageerror', (e) => pageErrors.push(String(e)));
    page.on('console', (m) => {
      if (m.type() === 'error') pageErrors.push(m.text());
    });
    const response = await page.goto(`${origin}/`, { waitUntil: 'load' });
    expect(response?.status()).toBe(200);
  });

  afterAll(async () => {
    await browser?.close();
    await new Promise<void>((resolve) => (server ? server.close(() => resolve()) : resolve()));
    if (userDataDir) rmSync(userDataDir, { recursive: true, force: true });
  });

  it('loads without a page error', () => {
    expect(pageErrors).toEqual([]);
  });

  answersAsTheAdapter({
    run,
    ids: () => page.evaluate(() => (globalThis as any).__fluxbook.ids() as string[]),
    same: sameResult,
  });

  it("makes no network request beyond the test server's own origin", async () => {
    await page.waitForLoadState('networkidle');
    expect(requests.length).toBeGreaterThan(0);
    expect(requests).toContain(`${origin}/functions.js`);
    expect(requests.filter((url) => new URL(url).origin !== origin)).toEqual([]);
    expect(pageErrors).toEqual([]);
  });
});
