// How much JavaScript (gzip) a route makes the browser fetch on a cold load, read off real
// Chromium's network traffic, so lazy routes and split chunks count as they really load.
import { gzipSync } from 'node:zlib';
import { chromium, type Response } from '@playwright/test';
import { singleFigure, type BenchFigure } from '../../shared/src/bench/index.js';
import { CHROMIUM_ARGS, CHROMIUM_PATH } from '../../client/e2e/chromium.js';

// The run route's chunks load whatever inspection id it is given; this one is not on the device.
const DRIVER_ROUTES = [
  { path: '/driver', label: '/driver' },
  { path: '/driver/start', label: '/driver/start' },
  { path: '/driver/inspections/first-load-probe', label: 'the run route /driver/inspections/:clientId' },
];

export async function signInToken(baseUrl: string, email: string): Promise<string> {
  const response = await fetch(`${baseUrl}/api/auth/login`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email, password: 'yardcall-demo' }),
  });
  if (!response.ok) throw new Error(`Signing in as ${email} failed: HTTP ${response.status}.`);
  return ((await response.json()) as { accessToken: string }).accessToken;
}

export async function measureFirstLoadJs(baseUrl: string): Promise<BenchFigure[]> {
  const browser = await chromium.launch({
    executablePath: CHROMIUM_PATH,
    args: CHROMIUM_ARGS,
  });
  try {
    const token = await signInToken(baseUrl, 'driver@yardcall.test');
    const figures: BenchFigure[] = [];
    for (const { path, label } of DRIVER_ROUTES) {
      const context = await browser.newContext();
      await context.addInitScript(`localStorage.setItem('yardcall.token', ${JSON.stringify(token)});`);
      const page = await context.newPage();
      const bodies: Promise<number>[] = [];
      const onResponse = (response: Response) => {
        if (response.request().resourceType() === 'script') {
          bodies.push(response.body().then((body) => gzipSync(body, { level: 9 }).length));
        }
      };
      page.on('response', onResponse);
      await page.goto(`${baseUrl}${path}`, { waitUntil: 'networkidle' });
      // Stop listening before the bodies are read, so nothing is read from a closing page.
      page.off('response', onResponse);
      const kb = (await Promise.all(bodies)).reduce((sum, bytes) => sum + bytes, 0) / 1024;
      const rounded = Math.round(kb * 10) / 10;
      figures.push(singleFigure(`first-load JS of ${label} (gzip)`, 'KB', rounded, 150));
      await context.close();
    }
    return figures;
  } finally {
    await browser.close();
  }
}
