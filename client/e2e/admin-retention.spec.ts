import { expect, test, type APIRequestContext } from '@playwright/test';
import pg from 'pg';
import type { InspectionResponse, RetentionSettings, VehicleResponse } from '@yardcall/shared';
import { apiHeaders, expectNoAxeViolations, screenshot, signIn } from './support';

// A short submitted post-trip with no defect, then aged two years in the database, so the purge has
// something past any allowed retention to remove.
async function oldReport(request: APIRequestContext): Promise<string> {
  const headers = await apiHeaders(request, 'aiyana.brooks@yardcall.test');
  const vehicles = (await (await request.get('/api/vehicles', { headers })).json()) as VehicleResponse[];
  const truck = vehicles.find((v) => v.unitNumber === 'KV-S31');
  if (!truck) throw new Error('No KV-S31 in the demo fleet.');
  const started = Date.now() - 10 * 60_000;
  const created = await request.post('/api/inspections', {
    headers,
    data: {
      vehicleIds: [truck.id],
      kind: 'post_trip',
      startedAt: new Date(started).toISOString(),
      clientId: crypto.randomUUID(),
    },
  });
  expect(created.status()).toBe(201);
  const inspection = (await created.json()) as InspectionResponse;
  const results = inspection.checklist.items.slice(0, 3).map((item, index) => ({
    itemKey: item.key,
    clientId: crypto.randomUUID(),
    answer: 'pass',
    answeredAt: new Date(started + (index + 1) * 6_000).toISOString(),
  }));
  expect((await request.put(`/api/inspections/${inspection.id}/results`, { headers, data: { results } })).ok()).toBe(
    true,
  );
  const submitted = await request.post(`/api/inspections/${inspection.id}/submit`, {
    headers,
    data: { signature: { name: 'Aiyana Brooks' } },
  });
  expect(submitted.ok(), await submitted.text()).toBe(true);

  const url = process.env.DATABASE_URL;
  if (!url) throw new Error('DATABASE_URL names the database the server under test uses.');
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  try {
    const age = "now() - interval '2 years'";
    await client.query(
      `UPDATE inspections SET started_at = ${age}, submitted_at = ${age}, updated_at = ${age} WHERE id = $1`,
      [inspection.id],
    );
    await client.query(`UPDATE item_results SET answered_at = ${age} WHERE inspection_id = $1`, [inspection.id]);
    await client.query(`UPDATE signatures SET signed_at = ${age} WHERE inspection_id = $1`, [inspection.id]);
  } finally {
    await client.end();
  }
  return inspection.id;
}

test('the admin sets the retention, is refused 2 months with the reason, and purges old records', async ({
  page,
  request,
}) => {
  const old = await oldReport(request);
  await signIn(page, 'admin@yardcall.test');
  await expect(page.getByRole('heading', { level: 1, name: 'Administration' })).toBeVisible();
  await expectNoAxeViolations(page, 'the admin home');
  await page.getByRole('link', { name: 'Record retention' }).first().click();
  await expect(page.getByRole('heading', { level: 1, name: 'Record retention' })).toBeVisible();
  const field = page.getByLabel('Keep reports for (months)');
  await expect(page.getByText(/49 CFR 396\.11\(a\)\(4\)/).first()).toBeVisible();
  await expectNoAxeViolations(page, 'the retention screen');

  await field.fill('2');
  await page.getByRole('button', { name: 'Save the retention' }).click();
  await expect(page.getByTestId('field-error')).toContainText('Keep reports at least 3 months');
  await expect(page.getByTestId('field-error')).toContainText('49 CFR 396.11(a)(4)');
  await expect(field).toHaveAttribute('aria-invalid', 'true');
  await screenshot(page, 'admin-retention-refused');
  await expectNoAxeViolations(page, 'the retention screen with its error');

  await field.fill('6');
  await page.getByRole('button', { name: 'Save the retention' }).click();
  await expect(page.getByTestId('retention-saved')).toHaveText('Saved: reports are kept 6 months.');
  const headers = await apiHeaders(request, 'admin@yardcall.test');
  const saved = (await (await request.get('/api/organizations/retention', { headers })).json()) as RetentionSettings;
  expect(saved.months).toBe(6);
  await page.reload();
  await expect(page.getByLabel('Keep reports for (months)')).toHaveValue('6');

  await page.getByTestId('purge-open').click();
  await expect(page.getByText('Remove old records now?')).toBeVisible();
  await screenshot(page, 'admin-retention-confirm');
  await expectNoAxeViolations(page, 'the purge confirmation');
  await page.getByTestId('purge-confirm').click();
  await expect(page.getByText('Old records removed')).toBeVisible();
  await expect(page.getByTestId('purge-count-inspections')).toHaveText(/^[1-9]\d*$/);
  await expect(page.getByTestId('purge-count-itemResults')).toHaveText(/^([3-9]|\d{2,})$/);
  await expect(page.getByTestId('purge-count-signatures')).toHaveText(/^[1-9]\d*$/);
  await screenshot(page, 'admin-retention-purged');
  await expectNoAxeViolations(page, 'the purge result');
  await page.getByRole('button', { name: 'Done' }).click();
  await expect(page.getByText('Old records removed')).toHaveCount(0);

  const gone = await request.get(`/api/inspections/${old}`, { headers });
  expect(gone.status()).toBe(404);
});
