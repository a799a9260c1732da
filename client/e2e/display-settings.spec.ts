import { expect, test, type Page } from '@playwright/test';
import { ROLE_HOMES, expectNoAxeViolations, screenshot, signIn } from './support';

test.use({ viewport: { width: 390, height: 844 }, deviceScaleFactor: 2, hasTouch: true, isMobile: true });

// Every control lies inside the viewport's width, is at least `minPx` in both directions and is
// not covered by another element at its centre.
async function controlsProblems(page: Page, minPx: number): Promise<string[]> {
  return page.evaluate((min) => {
    const problems: string[] = [];
    const width = document.documentElement.clientWidth;
    if (document.documentElement.scrollWidth > width + 1) {
      problems.push(`page scrolls sideways: ${document.documentElement.scrollWidth} > ${width}`);
    }
    const controls = document.querySelectorAll<HTMLElement>(
      'button, a[href], input, select, textarea, [role="switch"], [role="radio"], [role="slider"]',
    );
    for (const control of controls) {
      const style = getComputedStyle(control);
      if (style.visibility === 'hidden' || style.display === 'none') continue;
      if (
        control instanceof HTMLInputElement &&
        (control.type === 'hidden' || control.type === 'radio' || control.type === 'checkbox') &&
        style.opacity === '0'
      )
        continue;
      const box = control.getBoundingClientRect();
      // Visually hidden until focused (the skip link): not a control on screen.
      if (box.width <= 1 && box.height <= 1) continue;
      const name = control.getAttribute('aria-label') ?? control.textContent?.trim().slice(0, 30) ?? control.tagName;
      if (box.left < -1 || box.right > width + 1)
        problems.push(`"${name}" leaves the screen (${Math.round(box.left)}..${Math.round(box.right)})`);
      if (box.width < min || box.height < min)
        problems.push(`"${name}" is ${Math.round(box.width)}x${Math.round(box.height)} px`);
      control.scrollIntoView({ block: 'center' });
      const after = control.getBoundingClientRect();
      const hit = document.elementFromPoint(after.left + after.width / 2, after.top + after.height / 2);
      if (
        hit &&
        hit !== control &&
        !control.contains(hit) &&
        !hit.contains(control) &&
        !(hit instanceof HTMLLabelElement)
      ) {
        problems.push(`"${name}" is covered by ${hit.tagName.toLowerCase()}`);
      }
    }
    window.scrollTo(0, 0);
    return problems;
  }, minPx);
}

test('night theme at 200 % text on a phone keeps every control visible and usable', async ({ page }) => {
  const driver = ROLE_HOMES[0];
  await signIn(page, driver.email);
  await expect(page.getByRole('heading', { level: 1, name: driver.heading })).toBeVisible();

  await page.getByTestId('settings-link').click();
  await expect(page.getByRole('heading', { level: 1, name: 'Display settings' })).toBeVisible();
  await page.getByRole('radio', { name: 'Night (dim)' }).check();
  const slider = page.getByRole('slider', { name: 'Text size' });
  await slider.focus();
  await page.keyboard.press('End');
  await expect(page.locator('html')).toHaveClass(/theme-night/);
  await expect.poll(() => page.evaluate(() => document.documentElement.style.fontSize)).toBe('200%');
  await screenshot(page, 'settings-night-200');
  // WCAG 2.2 2.5.5 (enhanced target size): 44 x 44 CSS px.
  expect(await controlsProblems(page, 44)).toEqual([]);
  await expectNoAxeViolations(page, 'settings in night theme at 200 %');

  // Saved for the user: a fresh page load keeps them.
  await page.reload();
  await expect(page.locator('html')).toHaveClass(/theme-night/);

  for (const path of ['/driver', '/driver/start']) {
    await page.goto(path);
    await expect(page.getByRole('heading', { level: 1 })).toBeVisible();
    await expect.poll(() => page.evaluate(() => document.documentElement.style.fontSize)).toBe('200%');
    expect(await controlsProblems(page, 44), `controls on ${path}`).toEqual([]);
    await expectNoAxeViolations(page, `${path} in night theme at 200 %`);
    await screenshot(page, `night-200${path.replace(/\//g, '-')}`);
  }
});

test('glove mode makes the main controls at least 20 mm', async ({ page }) => {
  await signIn(page, 'driver@yardcall.test');
  // Signed in first: settings changed before the session exists stay on the device and are never sent.
  await expect(page.getByRole('heading', { level: 1, name: 'Driver home' })).toBeVisible();
  await page.goto('/settings');
  const saved = page.waitForResponse(
    (response) => response.url().endsWith('/api/auth/me/settings') && response.request().method() === 'PATCH',
  );
  await page.getByRole('switch', { name: 'Glove mode' }).click();
  await expect(page.locator('html')).toHaveClass(/glove/);
  await saved;
  await page.goto('/driver');
  const start = page.getByTestId('start-inspection');
  await expect(start).toBeVisible();
  const box = await start.boundingBox();
  // About 20 mm for gloved fingers (Duff et al. 2010): 20 mm is 75.6 CSS px at 96 px per inch.
  expect(box?.height ?? 0).toBeGreaterThanOrEqual(75);
  await screenshot(page, 'glove-driver-home');
});
