import { Injectable, Logger, type OnApplicationShutdown, type OnModuleInit } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import PgBoss from 'pg-boss';
import type { EntityManager } from 'typeorm';
import type { AppEnv } from '../config/env.validation';

// pg-boss keeps its tables in a schema of its own beside the app's (never in public).
export const JOBS_SCHEMA = 'pgboss';

export interface RetryPolicy {
  retryLimit: number;
  // Seconds before the first retry; doubled each time with backoff.
  retryDelay: number;
  retryBackoff: boolean;
}

export type JobHandler<T> = (data: T, job: { id: string; retryCount: number }) => Promise<void>;

// A job sent inside a database transaction is committed (or rolled back) with it.
function inTransaction(manager: EntityManager): PgBoss.Db {
  return {
    executeSql: async (text: string, values: unknown[]) => ({ rows: await manager.query<unknown[]>(text, values) }),
  };
}

// Owns the one PgBoss instance of the app: started on boot against the app's database, stopped on shutdown.
@Injectable()
export class JobsService implements OnModuleInit, OnApplicationShutdown {
  private readonly logger = new Logger('JobsService');
  private readonly boss: PgBoss;
  private readonly testMode: boolean;
  private started: Promise<void> | null = null;

  constructor(config: ConfigService<AppEnv, true>) {
    this.testMode = config.get('NODE_ENV', { infer: true }) === 'test';
    this.boss = new PgBoss({
      connectionString: config.get('DATABASE_URL', { infer: true }),
      schema: JOBS_SCHEMA,
      application_name: 'yardcall-jobs',
      max: 4,
    });
    this.boss.on('error', (error) => this.logger.error(`Job queue: ${error.message}`));
  }

  onModuleInit(): Promise<void> {
    return this.ready();
  }

  private ready(): Promise<void> {
    this.started ??= this.boss.start().then(() => undefined);
    return this.started;
  }

  async onApplicationShutdown(): Promise<void> {
    if (!this.started) return;
    await this.started.catch(() => undefined);
    // Work in flight is failed and retried by the next start; never hold the shutdown for long.
    await this.boss.stop({ graceful: !this.testMode, timeout: 5000, wait: true });
  }

  // Short delays in tests, so a retried job is seen within seconds.
  retryPolicy(production: RetryPolicy): RetryPolicy {
    return this.testMode ? { retryLimit: production.retryLimit, retryDelay: 1, retryBackoff: false } : production;
  }

  async createQueue(name: string, policy: RetryPolicy): Promise<void> {
    await this.ready();
    if (await this.boss.getQueue(name)) await this.boss.updateQueue(name, { name, ...policy });
    else await this.boss.createQueue(name, { name, ...policy });
  }

  // Each job of the queue runs the handler; a thrown error fails it, and the queue's policy retries it.
  async work<T extends object>(name: string, handler: JobHandler<T>): Promise<void> {
    await this.ready();
    await this.boss.work<T>(
      name,
      { includeMetadata: true, batchSize: 1, pollingIntervalSeconds: this.testMode ? 0.5 : 2 },
      async (jobs) => {
        for (const job of jobs) await handler(job.data, { id: job.id, retryCount: job.retryCount });
      },
    );
  }

  // Inside a transaction when a manager is given: the job exists only if the transaction commits.
  async send<T extends object>(name: string, data: T, manager?: EntityManager): Promise<string | null> {
    await this.ready();
    return this.boss.send(name, data, manager ? { db: inTransaction(manager) } : {});
  }

  async schedule(name: string, cron: string): Promise<void> {
    await this.ready();
    await this.boss.schedule(name, cron, {}, { tz: 'UTC' });
  }

  // Tests and the admin's view: how a job ended.
  async stateOf(name: string, id: string): Promise<{ state: string; retryCount: number } | null> {
    const job = await this.boss.getJobById(name, id, { includeArchive: true });
    return job ? { state: job.state, retryCount: job.retryCount } : null;
  }
}
