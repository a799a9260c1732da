import { Injectable, type OnApplicationBootstrap } from '@nestjs/common';
import type { EntityManager } from 'typeorm';
import { JOB_SEND_MAIL } from '../jobs/job-names';
import { JobsService, type RetryPolicy } from '../jobs/jobs.service';
import { MailService, type OutgoingMail } from './mail.service';

// One job per message, so a retry resends only the message that failed. Our own choice: five tries
// over about 15 minutes (30 s doubling) ride out a mail server's short outage.
const SEND_RETRY: RetryPolicy = { retryLimit: 5, retryDelay: 30, retryBackoff: true };

@Injectable()
export class MailQueue implements OnApplicationBootstrap {
  constructor(
    private readonly jobs: JobsService,
    private readonly mail: MailService,
  ) {}

  async onApplicationBootstrap(): Promise<void> {
    await this.jobs.createQueue(JOB_SEND_MAIL, this.jobs.retryPolicy(SEND_RETRY));
    await this.jobs.work<OutgoingMail>(JOB_SEND_MAIL, (message) => this.mail.send(message));
  }

  // Within the caller's transaction when a manager is given.
  async enqueue(messages: readonly OutgoingMail[], manager?: EntityManager): Promise<string[]> {
    const ids: string[] = [];
    for (const message of messages) {
      const id = await this.jobs.send(JOB_SEND_MAIL, { ...message }, manager);
      if (id) ids.push(id);
    }
    return ids;
  }
}
