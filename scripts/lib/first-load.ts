// How much JavaScript (gzip) a route makes the browser fetch on a cold load, read off real
// Chromium's network traffic, so lazy routes and split chunks count as they really load.
import { gzipSync } from 'node:zlib';
import { chromium } from '@playwright/test';

const CHROMIUM_ARGS = [
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

const DRIVER_ROUTES = ['/driver', '/driver/start'];

export async function measureFirstLoadJs(baseUrl: string): Promise<SizeFigure[]> {
  const browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: CHROMIUM_ARGS,
  });
  try {
    const signIn = (await (
      await fetch(`${baseUrl}/api/auth/login`, {
        method: 'POST',
        headers: { 'Content-Type': 'application/json' },
        body: JSON.stringify({ email: 'driver@yardcall.test', password: 'yardcall-demo' }),
      })
    ).json()) as { accessToken: string };
    const figures: SizeFigure[] = [];
    for (const route of DRIVER_ROUTES) {
      const context = await browser.newContext();
      await context.addInitScript(`localStorage.setItem('yardcall.token', ${JSON.stringify(signIn.accessToken)});`);
      const page = await context.newPage();
      const bodies: Promise<number>[] = [];
      page.on('response', (response) => {
        if (response.request().resourceType() === 'script') {
          bodies.push(response.body().then((body) => gzipSync(body, { level: 9 }).length));
        }
      });
      await page.goto(`${baseUrl}${route}`, { waitUntil: 'networkidle' });
      const kb = (await Promise.all(bodies)).reduce((sum, bytes) => sum + bytes, 0) / 1024;
      const rounded = Math.round(kb * 10) / 10;
      figures.push({
        name: `first-load JS of ${route} (gzip)`,
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
