import { Injectable, Logger, NotFoundException, type OnModuleDestroy, type OnModuleInit } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectRepository } from '@nestjs/typeorm';
import type { CaughtMail } from '@yardcall/shared';
import { createTransport, type Transporter } from 'nodemailer';
import { Repository } from 'typeorm';
import type { AppEnv } from '../config/env.validation';
import { User } from '../users/entities/user.entity';
import { SmtpCatcher } from './smtp-catcher';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
}

@Injectable()
export class MailService implements OnModuleInit, OnModuleDestroy {
  private readonly logger = new Logger('MailService');
  private transport: Transporter | null = null;
  private catcher: SmtpCatcher | null = null;

  constructor(
    private readonly config: ConfigService<AppEnv, true>,
    @InjectRepository(User) private readonly users: Repository<User>,
  ) {}

  async onModuleInit(): Promise<void> {
    const smtpUrl = this.config.get('SMTP_URL', { infer: true });
    if (smtpUrl) {
      this.transport = createTransport(smtpUrl);
      return;
    }
    this.catcher = new SmtpCatcher();
    const port = await this.catcher.listen();
    this.transport = createTransport({ host: '127.0.0.1', port, secure: false, ignoreTLS: true });
  }

  async onModuleDestroy(): Promise<void> {
    this.transport?.close();
    await this.catcher?.close();
  }

  async send(mail: OutgoingMail): Promise<void> {
    if (!this.transport) throw new Error('MailService used before the module was initialised');
    await this.transport.sendMail({ from: this.config.get('MAIL_FROM', { infer: true }), ...mail });
    this.logger.log(`Sent "${mail.subject}" to ${mail.to}.`);
  }

  // True when e-mail goes to the built-in catcher (no SMTP_URL): nothing reaches a real person.
  catchesMail(): boolean {
    return this.catcher !== null;
  }

  // Tests only: the loopback catcher refuses the next `count` messages (whose subject contains
  // `subjectContains`), so retries can be seen.
  failNextSends(count: number, subjectContains = ''): void {
    if (this.config.get('NODE_ENV', { infer: true }) !== 'test' || !this.catcher) {
      throw new Error('Failing sends on purpose works only in test mode with the built-in catcher.');
    }
    this.catcher.failNext(count, subjectContains);
  }

  // Caught messages sent to this organisation's users only: an admin never reads another organisation's mail.
  async outboxFor(organizationId: string): Promise<CaughtMail[]> {
    if (!this.catcher) {
      throw new NotFoundException('There is no outbox to show: e-mail goes to the SMTP server set in SMTP_URL.');
    }
    const members = await this.users.find({ where: { organizationId }, select: { email: true } });
    const emails = new Set(members.map((m) => m.email.toLowerCase()));
    return this.catcher
      .list()
      .filter((m) => m.to.some((address) => emails.has(address.toLowerCase())))
      .reverse();
  }
}
