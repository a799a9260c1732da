import { expect, test } from '@playwright/test';
import { ROLE_HOMES, expectNoAxeViolations, screenshot, signIn } from './support';

test('the sign-in screen has no accessibility violations', async ({ page }) => {
  await page.goto('/sign-in');
  await expect(page.getByRole('heading', { level: 1, name: 'Sign in' })).toBeVisible();
  await expectNoAxeViolations(page, 'sign-in');
  await screenshot(page, 'sign-in');
});

test('a wrong password is refused with a message a person can act on', async ({ page }) => {
  await signIn(page, 'driver@yardcall.test', 'not-the-password');
  await expect(page.getByRole('alert')).toContainText(/e-?mail or password/i);
  await expect(page).toHaveURL(/\/sign-in/);
});

for (const home of ROLE_HOMES) {
  test(`the ${home.role} signs in and lands on their home`, async ({ page }) => {
    await signIn(page, home.email);
    await expect(page).toHaveURL(new RegExp(`${home.path}$`));
    await expect(page.getByRole('heading', { level: 1, name: home.heading })).toBeVisible();
    await expect(page.getByTestId(`home-${home.role}`)).toBeVisible();
    await expectNoAxeViolations(page, `the ${home.role} home`);
    await screenshot(page, `home-${home.role}`);
  });
}

test('a signed-out visitor is sent to sign in and comes back to the page asked for', async ({ page }) => {
  await page.goto('/driver/start');
  await expect(page).toHaveURL(/\/sign-in\?next=%2Fdriver%2Fstart/);
  await page.getByLabel('E-mail address').fill('driver@yardcall.test');
  await page.getByLabel('Password', { exact: true }).fill('yardcall-demo');
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
  await expect(page.getByRole('heading', { level: 1, name: 'Start an inspection' })).toBeVisible();
  await expect(page.getByTestId('vehicle-picker')).toBeVisible();
});
