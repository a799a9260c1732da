// How much JavaScript (gzip) a route makes the browser fetch on a cold load, read off real
// Chromium's network traffic, so lazy routes and split chunks count as they really load.
import { gzipSync } from 'node:zlib';
import { chromium, type Response } from '@playwright/test';

export const CHROMIUM_ARGS = [
  '--no-sandbox',
  '--disable-gpu',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--no-first-run',
  '--disable-quic',
];

export interface SizeFigure {
  name: string;
  unit: 'KB';
  p50: number;
  p95: number;
  p99: number;
  goal: number;
}

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

export async function measureFirstLoadJs(baseUrl: string): Promise<SizeFigure[]> {
  const browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: CHROMIUM_ARGS,
  });
  try {
    const token = await signInToken(baseUrl, 'driver@yardcall.test');
    const figures: SizeFigure[] = [];
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
      figures.push({
        name: `first-load JS of ${label} (gzip)`,
        unit: 'KB',
        p50: rounded,
        p95: rounded,
        p99: rounded,
        goal: 150,
      });
      await context.close();
    }
    return figures;
  } finally {
    await browser.close();
  }
}
