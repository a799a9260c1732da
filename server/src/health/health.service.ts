import { Injectable, Logger } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { HealthResponse } from '@yardcall/shared';
import { DataSource } from 'typeorm';

// A health check must answer quickly even when the database hangs.
const DATABASE_TIMEOUT_MS = 2000;

@Injectable()
export class HealthService {
  private readonly logger = new Logger('HealthService');

  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  async check(): Promise<HealthResponse> {
    let timer: NodeJS.Timeout | undefined;
    try {
      await Promise.race([
        this.dataSource.query('SELECT 1'),
        new Promise((_, reject) => {
          timer = setTimeout(
            () => reject(new Error(`no answer within ${DATABASE_TIMEOUT_MS} ms`)),
            DATABASE_TIMEOUT_MS,
          );
        }),
      ]);
      return { status: 'ok', database: 'up' };
    } catch (error) {
      this.logger.warn(`Database check failed: ${error instanceof Error ? error.message : String(error)}`);
      return { status: 'error', database: 'down' };
    } finally {
      clearTimeout(timer);
    }
  }
}
