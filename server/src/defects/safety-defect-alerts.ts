import { Injectable, Logger, type OnApplicationBootstrap } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { DEFAULT_TIME_ZONE } from '@yardcall/shared';
import { DataSource, In } from 'typeorm';
import type { AppEnv } from '../config/env.validation';
import { Organization } from '../organizations/entities/organization.entity';
import { Inspection } from '../inspections/entities/inspection.entity';
import { JOB_SAFETY_DEFECT_REPORTED, type SafetyDefectReportedJob } from '../jobs/job-names';
import { JobsService, type RetryPolicy } from '../jobs/jobs.service';
import { MailQueue } from '../mail/mail-queue';
import type { OutgoingMail } from '../mail/mail.service';
import { User } from '../users/entities/user.entity';
import { Defect } from './entities/defect.entity';
import { safetyDefectMail, type SafetyDefectFacts } from './safety-defect-mail-text';

// Our own choice: the fan-out touches only the database, so a few quick retries are enough.
const FAN_OUT_RETRY: RetryPolicy = { retryLimit: 3, retryDelay: 10, retryBackoff: true };

// When a submitted report opens a safety defect, every mechanic and supervisor of the organisation
// gets one e-mail: one job fans out to one send job per person (retried on its own).
@Injectable()
export class SafetyDefectAlerts implements OnApplicationBootstrap {
  private readonly logger = new Logger('SafetyDefectAlerts');

  constructor(
    private readonly jobs: JobsService,
    private readonly mailQueue: MailQueue,
    private readonly dataSource: DataSource,
    private readonly config: ConfigService<AppEnv, true>,
  ) {}

  async onApplicationBootstrap(): Promise<void> {
    await this.jobs.createQueue(JOB_SAFETY_DEFECT_REPORTED, this.jobs.retryPolicy(FAN_OUT_RETRY));
    await this.jobs.work<SafetyDefectReportedJob>(JOB_SAFETY_DEFECT_REPORTED, (data) => this.fanOut(data));
  }

  async fanOut({ organizationId, inspectionId }: SafetyDefectReportedJob): Promise<void> {
    const messages = await this.compose(organizationId, inspectionId);
    // One transaction: either every message is queued or none is (a retry then starts over).
    await this.dataSource.transaction((manager) => this.mailQueue.enqueue(messages, manager));
    this.logger.log(`Queued ${messages.length} safety-defect e-mail(s) for inspection ${inspectionId}.`);
  }

  async compose(organizationId: string, inspectionId: string): Promise<OutgoingMail[]> {
    const manager = this.dataSource.manager;
    const inspection = await manager.findOneBy(Inspection, { id: inspectionId, organizationId });
    if (!inspection) return [];
    const [defects, driver, recipients, organization] = await Promise.all([
      manager.find(Defect, {
        where: { inspectionId, organizationId, safety: true },
        order: { createdAt: 'ASC', id: 'ASC' },
      }),
      manager.findOne(User, { select: { id: true, name: true }, where: { id: inspection.driverId } }),
      manager.find(User, {
        select: { id: true, email: true, role: true, settings: true },
        where: { organizationId, role: In(['mechanic', 'supervisor']), status: 'active' },
        order: { email: 'ASC' },
      }),
      manager.findOne(Organization, { select: { id: true, timeZone: true }, where: { id: organizationId } }),
    ]);
    if (defects.length === 0) return [];
    const unitOf = new Map(inspection.vehicles.map((v) => [v.id, v.unitNumber]));
    const facts: SafetyDefectFacts = {
      driverName: driver?.name ?? null,
      kind: inspection.kind,
      units: inspection.vehicles.map((v) => v.unitNumber),
      submittedAt: inspection.submittedAt,
      timeZone: organization?.timeZone ?? DEFAULT_TIME_ZONE,
      defects: defects.map((d) => ({
        unit: unitOf.get(d.vehicleId) ?? '?',
        title: d.title,
        positionLabel: d.positionLabel,
        detail: d.detail,
      })),
      link: '',
    };
    const publicUrl = this.config.get('PUBLIC_URL', { infer: true });
    // Each person in their own language, with the link to the screen of their own job: the mechanic's
    // open defects, the supervisor's page of the inspection.
    return recipients.map((r) =>
      safetyDefectMail(r.settings?.locale === 'es' ? 'es' : 'en', r.email, {
        ...facts,
        link: r.role === 'mechanic' ? `${publicUrl}/mechanic` : `${publicUrl}/supervisor/inspections/${inspection.id}`,
      }),
    );
  }
}
