// Lighthouse's mobile profile (simulated slow 4G, a mid-range phone's CPU) against the built app
// in Debian's Chromium: total blocking time of /driver/start for a signed-in driver, and the
// largest contentful paint of the sign-in page on a cold load.
import { spawn } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium } from '@playwright/test';
import lighthouse from 'lighthouse';
import type { BenchFigure } from '../../shared/src/bench/index.js';
import { CHROMIUM_ARGS, CHROMIUM_PATH } from '../../client/e2e/chromium.js';
import { signInToken } from './first-load.js';
import { stopChild } from './run.js';
import { freePort } from './stack.js';

interface Measured {
  totalBlockingTimeMs: number;
  largestContentfulPaintMs: number;
}

// The budgets (our own goals): TBT at most 200 ms, LCP at most 2.5 s.
export const DRIVER_START_TBT_GOAL_MS = 200;
export const SIGN_IN_LCP_GOAL_MS = 2500;

// A browser Lighthouse drives through its debugging port (one Playwright launched itself made
// Lighthouse hang), with a profile of its own.
async function startChromium(): Promise<{ port: number; stop: () => Promise<void> }> {
  const port = await freePort();
  const profile = mkdtempSync(join(tmpdir(), 'yardcall-lighthouse-'));
  const child = spawn(
    CHROMIUM_PATH,
    [
      '--headless=new',
      `--remote-debugging-port=${port}`,
      `--user-data-dir=${profile}`,
      ...CHROMIUM_ARGS,
      'about:blank',
    ],
    // A process group of its own, so its helper processes stop with it.
    { stdio: 'ignore', detached: true },
  );
  const deadline = Date.now() + 30_000;
  while (Date.now() < deadline) {
    try {
      if ((await fetch(`http://127.0.0.1:${port}/json/version`)).ok) break;
    } catch {
      // Not listening yet.
    }
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
  return {
    port,
    async stop() {
      const exited = stopChild(child);
      try {
        if (child.pid !== undefined) process.kill(-child.pid, 'SIGTERM');
      } catch {
        // The group is gone already.
      }
      await exited;
      await new Promise((resolve) => setTimeout(resolve, 500));
      try {
        rmSync(profile, { recursive: true, force: true, maxRetries: 10, retryDelay: 200 });
      } catch {
        // A helper still writing: the temporary profile is left for the system to clear.
      }
    },
  };
}

async function audit(url: string, port: number, keepStorage: boolean): Promise<Measured> {
  const result = await lighthouse(url, {
    port,
    output: 'json',
    logLevel: 'error',
    onlyCategories: ['performance'],
    disableStorageReset: keepStorage,
  });
  const audits = result?.lhr.audits;
  const tbt = audits?.['total-blocking-time']?.numericValue;
  const lcp = audits?.['largest-contentful-paint']?.numericValue;
  if (tbt === undefined || lcp === undefined) {
    throw new Error(`Lighthouse measured no total blocking time or largest contentful paint for ${url}.`);
  }
  return { totalBlockingTimeMs: tbt, largestContentfulPaintMs: lcp };
}

// Signed in as the demo driver, with the start screen opened once (its service worker and the
// phone's copy of the start data in place), as a driver finds it on the second morning.
async function signInAndWarm(baseUrl: string, port: number): Promise<void> {
  const token = await signInToken(baseUrl, 'driver@yardcall.test');
  const browser = await chromium.connectOverCDP(`http://127.0.0.1:${port}`);
  try {
    const context = browser.contexts()[0] ?? (await browser.newContext());
    const page = await context.newPage();
    await page.goto(`${baseUrl}/sign-in`);
    // Page code as text: the scripts compile without the DOM's types.
    await page.evaluate(`localStorage.setItem('yardcall.token', ${JSON.stringify(token)})`);
    await page.goto(`${baseUrl}/driver/start`, { waitUntil: 'networkidle' });
    await page.evaluate('navigator.serviceWorker.ready.then(() => true)');
    await page.close();
  } finally {
    // Leaves the browser running: only this connection closes.
    await browser.close();
  }
}

function summarize(name: string, values: number[], goal: number): BenchFigure {
  const sorted = [...values].sort((a, b) => a - b);
  const round = (n: number) => Math.round(n);
  const median = sorted[Math.floor(sorted.length / 2)] ?? Number.NaN;
  const worst = sorted.at(-1) ?? Number.NaN;
  return { name, unit: 'ms', p50: round(median), p95: round(worst), p99: round(worst), goal, judgedAt: 'p50' };
}

// `runs` Lighthouse runs of each page (3 by default); the median is judged, the worst shown as p95/p99.
export async function measureLighthouse(baseUrl: string, runs = 3): Promise<BenchFigure[]> {
  const signInLcp: number[] = [];
  const startTbt: number[] = [];
  for (let run = 0; run < runs; run += 1) {
    // Cold: a fresh profile, and Lighthouse clears the origin's storage first.
    const cold = await startChromium();
    try {
      signInLcp.push((await audit(`${baseUrl}/sign-in`, cold.port, false)).largestContentfulPaintMs);
    } finally {
      await cold.stop();
    }
    const warm = await startChromium();
    try {
      await signInAndWarm(baseUrl, warm.port);
      startTbt.push((await audit(`${baseUrl}/driver/start`, warm.port, true)).totalBlockingTimeMs);
    } finally {
      await warm.stop();
    }
  }
  return [
    summarize(
      'Lighthouse mobile: total blocking time of /driver/start (signed in)',
      startTbt,
      DRIVER_START_TBT_GOAL_MS,
    ),
    summarize('Lighthouse mobile: largest contentful paint of the sign-in page (cold)', signInLcp, SIGN_IN_LCP_GOAL_MS),
  ];
}
