import request from 'supertest';
import { startApp, type TestApp } from './helpers';

describe('health', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startApp();
  });
  afterAll(async () => {
    await t.close();
  });

  it('answers ok when the database answers SELECT 1', async () => {
    const response = await request(t.url).get('/api/health');
    expect(response.status).toBe(200);
    expect(response.body).toEqual({ status: 'ok', database: 'up' });
  });
});
