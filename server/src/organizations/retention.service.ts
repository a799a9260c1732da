import { Inject, Injectable, Logger, NotFoundException, type OnApplicationBootstrap } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import {
  RETENTION_MIN_MONTHS,
  RetentionError,
  checkRetentionMonths,
  retentionCutoff,
  type RetentionPurgeResult,
  type RetentionSettings,
} from '@yardcall/shared';
import { DataSource, Repository } from 'typeorm';
import { ApiValidationException } from '../common/api-validation.exception';
import { JOB_RETENTION_PURGE } from '../jobs/job-names';
import { JobsService } from '../jobs/jobs.service';
import { OBJECT_STORAGE, type ObjectStorage } from '../storage/object-storage';
import { Organization } from './entities/organization.entity';

// Inspections removed per transaction, so a large first purge never holds long locks.
const BATCH = 200;
// Daily, at a quiet hour (UTC).
const PURGE_CRON = '17 3 * * *';

type Removed = RetentionPurgeResult['removed'];

// A submitted inspection may go only when every record of it is older than the cutoff: the report,
// its answers, notes, photos, defects, repair certifications and signatures (the next driver's review
// too). One with a defect still open, or only deferred, is never removed: that is live work, whatever
// its age. Inspections in progress are never touched.
const CANDIDATES_SQL = `
SELECT i.id FROM inspections i
 WHERE i.organization_id = $1 AND i.status = 'submitted'
   AND i.started_at < $2 AND i.submitted_at < $2 AND i.updated_at < $2
   AND NOT EXISTS (SELECT 1 FROM item_results r WHERE r.inspection_id = i.id AND r.answered_at >= $2)
   AND NOT EXISTS (SELECT 1 FROM signatures s WHERE s.inspection_id = i.id AND s.signed_at >= $2)
   AND NOT EXISTS (SELECT 1 FROM defects d WHERE d.inspection_id = i.id
                     AND (d.status IN ('open', 'deferred') OR d.created_at >= $2 OR d.updated_at >= $2))
   AND NOT EXISTS (SELECT 1 FROM repairs p JOIN defects d ON d.id = p.defect_id
                    WHERE d.inspection_id = i.id AND p.signed_at >= $2)
   AND NOT EXISTS (SELECT 1 FROM voice_notes n WHERE n.inspection_id = i.id AND n.created_at >= $2)
   AND NOT EXISTS (SELECT 1 FROM photos f WHERE f.inspection_id = i.id AND f.created_at >= $2)
 ORDER BY i.started_at, i.id
 LIMIT ${BATCH}
 FOR UPDATE OF i SKIP LOCKED`;

const KEPT_OPEN_SQL = `
SELECT count(*)::int AS n FROM inspections i
 WHERE i.organization_id = $1 AND i.status = 'submitted' AND i.submitted_at < $2
   AND EXISTS (SELECT 1 FROM defects d WHERE d.inspection_id = i.id AND d.status IN ('open', 'deferred'))`;

const COUNTS_SQL = `
SELECT (SELECT count(*) FROM item_results WHERE inspection_id = ANY($1::uuid[]))::int AS "itemResults",
       (SELECT count(*) FROM voice_notes WHERE inspection_id = ANY($1::uuid[]))::int AS "voiceNotes",
       (SELECT count(*) FROM photos WHERE inspection_id = ANY($1::uuid[]))::int AS "photos",
       (SELECT count(*) FROM defects WHERE inspection_id = ANY($1::uuid[]))::int AS "defects",
       (SELECT count(*) FROM repairs p JOIN defects d ON d.id = p.defect_id
         WHERE d.inspection_id = ANY($1::uuid[]))::int AS "repairs",
       (SELECT count(*) FROM signatures WHERE inspection_id = ANY($1::uuid[]))::int AS "signatures"`;

function emptyRemoved(): Removed {
  return {
    inspections: 0,
    itemResults: 0,
    voiceNotes: 0,
    photos: 0,
    defects: 0,
    repairs: 0,
    signatures: 0,
    storedObjects: 0,
  };
}

@Injectable()
export class RetentionService implements OnApplicationBootstrap {
  private readonly logger = new Logger('RetentionService');

  constructor(
    @InjectRepository(Organization) private readonly organizations: Repository<Organization>,
    private readonly dataSource: DataSource,
    private readonly jobs: JobsService,
    @Inject(OBJECT_STORAGE) private readonly storage: ObjectStorage,
  ) {}

  async onApplicationBootstrap(): Promise<void> {
    await this.jobs.createQueue(JOB_RETENTION_PURGE, { retryLimit: 2, retryDelay: 600, retryBackoff: false });
    await this.jobs.work(JOB_RETENTION_PURGE, () => this.purgeAll());
    await this.jobs.schedule(JOB_RETENTION_PURGE, PURGE_CRON);
  }

  async settings(organizationId: string, now = new Date()): Promise<RetentionSettings> {
    const organization = await this.organizations.findOneBy({ id: organizationId });
    if (!organization) throw new NotFoundException('Your organisation was not found.');
    return this.toSettings(organization.retentionMonths, now);
  }

  async update(organizationId: string, months: number): Promise<RetentionSettings> {
    try {
      checkRetentionMonths(months);
    } catch (error) {
      if (error instanceof RetentionError)
        throw new ApiValidationException([{ field: 'months', message: error.message }]);
      throw error;
    }
    const result = await this.organizations.update({ id: organizationId }, { retentionMonths: months });
    if (!result.affected) throw new NotFoundException('Your organisation was not found.');
    return this.toSettings(months, new Date());
  }

  // The scheduled run: every organisation with its own setting.
  async purgeAll(now = new Date()): Promise<void> {
    const organizations = await this.organizations.find({ select: { id: true } });
    for (const { id } of organizations) {
      const result = await this.purge(id, now);
      if (result.removed.inspections > 0) {
        this.logger.log(`Removed ${result.removed.inspections} inspection(s) older than ${result.cutoff} in ${id}.`);
      }
    }
  }

  async purge(organizationId: string, now = new Date()): Promise<RetentionPurgeResult> {
    const { months } = await this.settings(organizationId, now);
    // Never below the minimum, whatever is stored.
    const at = retentionCutoff(now, Math.max(months, RETENTION_MIN_MONTHS));
    const removed = emptyRemoved();
    for (;;) {
      const { ids, objectKeys, counts } = await this.dataSource.transaction(async (manager) => {
        const rows = await manager.query<{ id: string }[]>(CANDIDATES_SQL, [organizationId, at]);
        const batch = rows.map((r) => r.id);
        if (batch.length === 0) return { ids: batch, objectKeys: [] as string[], counts: null };
        const [row] = await manager.query<Omit<Removed, 'inspections' | 'storedObjects'>[]>(COUNTS_SQL, [batch]);
        const keys = await manager.query<{ object_key: string }[]>(
          `SELECT object_key FROM voice_notes WHERE inspection_id = ANY($1::uuid[])
           UNION ALL SELECT object_key FROM photos WHERE inspection_id = ANY($1::uuid[])`,
          [batch],
        );
        // Answers, notes, photos, defects, their repairs and the signatures go with it (ON DELETE CASCADE).
        await manager.query(`DELETE FROM inspections WHERE id = ANY($1::uuid[])`, [batch]);
        return { ids: batch, objectKeys: keys.map((k) => k.object_key), counts: row ?? null };
      });
      if (ids.length === 0) break;
      removed.inspections += ids.length;
      if (counts) {
        removed.itemResults += counts.itemResults;
        removed.voiceNotes += counts.voiceNotes;
        removed.photos += counts.photos;
        removed.defects += counts.defects;
        removed.repairs += counts.repairs;
        removed.signatures += counts.signatures;
      }
      // After the commit: a file left behind by a failed delete is only wasted space, while a file
      // deleted for a row that stayed would lose a record.
      for (const key of objectKeys) {
        try {
          await this.storage.delete(key);
          removed.storedObjects += 1;
        } catch (error) {
          this.logger.warn(`Could not delete stored object ${key}: ${(error as Error).message}`);
        }
      }
      if (ids.length < BATCH) break;
    }
    const [kept] = await this.dataSource.query<{ n: number }[]>(KEPT_OPEN_SQL, [organizationId, at]);
    return { cutoff: at.toISOString(), removed, keptWithOpenDefects: kept?.n ?? 0 };
  }

  private toSettings(months: number, now: Date): RetentionSettings {
    return {
      months,
      minimumMonths: RETENTION_MIN_MONTHS,
      cutoff: retentionCutoff(now, Math.max(months, RETENTION_MIN_MONTHS)).toISOString(),
    };
  }
}
