import type { CaughtMail, ChecklistItem, ResultUpsert } from '@yardcall/shared';
import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { MailService } from '../src/mail/mail.service';
import { answerAndSubmit, bearer, bodyOf, newTractor, startInspection, suiteApp } from './helpers';

describe('e-mail on safety defects, through the job queue', () => {
  const { t, tokens } = suiteApp();

  async function submitWithDefects(vehicleId: string, pick: (items: ChecklistItem[]) => ChecklistItem[]) {
    const started = await startInspection(t.url, tokens.driver, { vehicleIds: [vehicleId] });
    const bad = new Set(pick(started.checklist.items).map((i) => i.key));
    const results: ResultUpsert[] = started.checklist.items
      .filter((i) => bad.has(i.key))
      .map((item) => ({
        itemKey: item.key,
        answer: 'defect',
        detail: 'Cracked, "worse" since Monday',
        answeredAt: new Date().toISOString(),
        clientId: randomUUID(),
      }));
    return answerAndSubmit(t.url, tokens.driver, started.id, results);
  }

  it("holds the demo history's safety-defect e-mails from the boot, made again since the catcher keeps none", async () => {
    const outbox = bodyOf<CaughtMail[]>(await request(t.url).get('/api/mail/outbox').set(bearer(tokens.admin)));
    const demo = outbox.filter((m) => m.subject.startsWith('Safety defect on unit KV-T22:'));
    // One to each mechanic and supervisor of the organisation, as a real report's alert.
    expect(demo.flatMap((m) => m.to).sort()).toEqual(await recipients());
    expect(demo[0]!.text).toMatch(/Trailer air lines/);
  });

  async function recipients(role?: 'mechanic'): Promise<string[]> {
    const rows = await t.dataSource.query<{ email: string }[]>(
      `SELECT u.email FROM users u JOIN users a ON a.organization_id = u.organization_id
        WHERE a.email = 'admin@yardcall.test' AND u.role = ANY($1) AND u.status = 'active'
        ORDER BY u.email`,
      [role ? [role] : ['mechanic', 'supervisor']],
    );
    return rows.map((r) => r.email);
  }

  // Polls the admin's outbox until `count` messages about this unit arrived (or the time is up).
  async function waitForMail(unitNumber: string, count: number, timeoutMs = 20_000): Promise<CaughtMail[]> {
    const until = Date.now() + timeoutMs;
    let found: CaughtMail[] = [];
    while (Date.now() < until) {
      const outbox = bodyOf<CaughtMail[]>(await request(t.url).get('/api/mail/outbox').set(bearer(tokens.admin)));
      found = outbox.filter((m) => m.subject.includes(unitNumber));
      if (found.length >= count) return found;
      await new Promise((resolve) => setTimeout(resolve, 250));
    }
    return found;
  }

  it('retries a failed send and then delivers one e-mail to each mechanic and supervisor', async () => {
    const to = await recipients();
    const mechanics = await recipients('mechanic');
    expect(to.length).toBeGreaterThanOrEqual(2);
    const vehicle = await newTractor(t.url, tokens.admin, 'MQ');
    // The loopback catcher refuses the next two messages about this unit, as a busy mail server would.
    t.app.get(MailService).failNextSends(2, vehicle.unitNumber);
    const report = await submitWithDefects(vehicle.id, (items) =>
      items.filter((i) => i.safety && i.expects.type === 'check').slice(0, 2),
    );

    const mail = await waitForMail(vehicle.unitNumber, to.length);
    expect(mail.flatMap((m) => m.to).sort()).toEqual(to);
    for (const message of mail) {
      expect(message.subject).toContain(`Safety defect on unit ${vehicle.unitNumber}`);
      expect(message.text).toContain('Dana Okafor');
      for (const defect of report.defects.filter((d) => d.safety)) expect(message.text).toContain(defect.title);
      // Each to the screen of their own job.
      expect(message.text).toContain(
        message.to.some((address) => mechanics.includes(address))
          ? 'http://yardcall.example.test/mechanic'
          : `http://yardcall.example.test/supervisor/inspections/${report.id}`,
      );
    }

    // The queue shows the retries: every message sent, at least one after a failure.
    const jobs = await t.dataSource.query<{ state: string; retry_count: number; to: string }[]>(
      `SELECT state, retry_count, data->>'to' AS to FROM pgboss.job
        WHERE name = 'send-mail' AND data->>'subject' LIKE $1`,
      [`%${vehicle.unitNumber}%`],
    );
    expect(jobs.map((j) => j.to).sort()).toEqual(to);
    const until = Date.now() + 5000;
    while (Date.now() < until) {
      const states = await t.dataSource.query<{ state: string }[]>(
        `SELECT state FROM pgboss.job WHERE name = 'send-mail' AND data->>'subject' LIKE $1`,
        [`%${vehicle.unitNumber}%`],
      );
      if (states.every((s) => s.state === 'completed')) break;
      await new Promise((resolve) => setTimeout(resolve, 200));
    }
    const final = await t.dataSource.query<{ state: string; retry_count: number }[]>(
      `SELECT state, retry_count FROM pgboss.job WHERE name = 'send-mail' AND data->>'subject' LIKE $1`,
      [`%${vehicle.unitNumber}%`],
    );
    expect(final.every((j) => j.state === 'completed')).toBe(true);
    expect(final.reduce((sum, j) => sum + j.retry_count, 0)).toBe(2);
    // One fan-out job for the report.
    const fanOut = await t.dataSource.query<{ n: number }[]>(
      `SELECT count(*)::int AS n FROM pgboss.job WHERE name = 'safety-defect-reported' AND data->>'inspectionId' = $1`,
      [report.id],
    );
    expect(fanOut[0]!.n).toBe(1);
  });

  it('sends nothing for a report without a safety defect', async () => {
    const vehicle = await newTractor(t.url, tokens.admin, 'MN');
    const report = await submitWithDefects(vehicle.id, (items) =>
      items.filter((i) => !i.safety && i.expects.type === 'check').slice(0, 1),
    );
    expect(report.defects.some((d) => d.safety)).toBe(false);
    const fanOut = await t.dataSource.query<{ n: number }[]>(
      `SELECT count(*)::int AS n FROM pgboss.job WHERE name = 'safety-defect-reported' AND data->>'inspectionId' = $1`,
      [report.id],
    );
    expect(fanOut[0]!.n).toBe(0);
    expect(await waitForMail(vehicle.unitNumber, 1, 1500)).toEqual([]);
  });
});
