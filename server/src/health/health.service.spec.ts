import type { DataSource } from 'typeorm';
import { HealthService } from './health.service';

describe('HealthService', () => {
  it('reports the database down when SELECT 1 fails', async () => {
    const failing = { query: () => Promise.reject(new Error('connection refused')) } as unknown as DataSource;
    await expect(new HealthService(failing).check()).resolves.toEqual({ status: 'error', database: 'down' });
  });

  it('reports ok when SELECT 1 answers', async () => {
    const working = { query: () => Promise.resolve([{ '?column?': 1 }]) } as unknown as DataSource;
    await expect(new HealthService(working).check()).resolves.toEqual({ status: 'ok', database: 'up' });
  });
});
