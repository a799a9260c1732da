import { Injectable, Logger, type OnApplicationBootstrap } from '@nestjs/common';
import { DataSource } from 'typeorm';
import { HISTORY_CLIENT_PREFIX } from '../database/seed-history';
import { MailService } from '../mail/mail.service';
import { SafetyDefectAlerts } from './safety-defect-alerts';

// The built-in catcher keeps e-mail in memory only, so a restart empties the outbox, the demo's too. On
// each boot with the catcher, the safety-defect e-mails of the seeded demo history are made again, the
// same way a real report makes them, so the admin's outbox shows what the history would have sent.
// With real SMTP nothing is sent: the demo never writes to real people.
@Injectable()
export class DemoOutbox implements OnApplicationBootstrap {
  private readonly logger = new Logger('DemoOutbox');

  constructor(
    private readonly mail: MailService,
    private readonly alerts: SafetyDefectAlerts,
    private readonly dataSource: DataSource,
  ) {}

  async onApplicationBootstrap(): Promise<void> {
    if (!this.mail.catchesMail()) return;
    const reports = await this.dataSource.query<{ id: string; organization_id: string }[]>(
      `SELECT i.id, i.organization_id FROM inspections i
        WHERE i.client_id LIKE $1 AND i.status = 'submitted'
          AND EXISTS (SELECT 1 FROM defects d WHERE d.inspection_id = i.id AND d.safety)
        ORDER BY i.submitted_at, i.id`,
      [`${HISTORY_CLIENT_PREFIX}%`],
    );
    let sent = 0;
    for (const report of reports) {
      for (const message of await this.alerts.compose(report.organization_id, report.id)) {
        await this.mail.send(message);
        sent += 1;
      }
    }
    if (sent > 0) this.logger.log(`Made the demo history's ${sent} e-mail(s) again for the outbox.`);
  }
}
