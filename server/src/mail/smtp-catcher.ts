import { Logger } from '@nestjs/common';
import type { CaughtMail } from '@yardcall/shared';
import { simpleParser, type AddressObject } from 'mailparser';
import { randomUUID } from 'node:crypto';
import type { AddressInfo } from 'node:net';
import { SMTPServer } from 'smtp-server';

// Enough for a demo and a test run; the oldest messages go first.
const MAX_KEPT = 500;

function addresses(field: AddressObject | AddressObject[] | undefined): string[] {
  const list = Array.isArray(field) ? field : field ? [field] : [];
  return list.flatMap((entry) => entry.value.map((a) => a.address ?? '')).filter((a) => a !== '');
}

// An SMTP server on loopback that keeps every message in memory: the default when no SMTP_URL is set.
export class SmtpCatcher {
  private readonly logger = new Logger('SmtpCatcher');
  private readonly messages: CaughtMail[] = [];
  private readonly server: SMTPServer;
  // Test mode only: how many of the next messages (whose subject contains `failMatch`) to refuse.
  private failuresLeft = 0;
  private failMatch = '';

  constructor() {
    this.server = new SMTPServer({
      authOptional: true,
      disabledCommands: ['STARTTLS', 'AUTH'],
      logger: false,
      onData: (stream, _session, callback) => {
        simpleParser(stream)
          .then((parsed) => {
            if (this.failuresLeft > 0 && (parsed.subject ?? '').includes(this.failMatch)) {
              this.failuresLeft -= 1;
              callback(Object.assign(new Error('Try again later (test failure)'), { responseCode: 451 }));
              return;
            }
            this.messages.push({
              id: randomUUID(),
              to: addresses(parsed.to),
              subject: parsed.subject ?? '',
              text: parsed.text ?? '',
              receivedAt: new Date().toISOString(),
            });
            if (this.messages.length > MAX_KEPT) this.messages.shift();
            // Accept only once stored, so sendMail() resolving means the message can be read.
            callback();
          })
          .catch((error: unknown) => callback(error instanceof Error ? error : new Error(String(error))));
      },
    });
  }

  // Listens on a free port on 127.0.0.1 and answers it.
  listen(): Promise<number> {
    return new Promise((resolve, reject) => {
      this.server.once('error', reject);
      this.server.listen(0, '127.0.0.1', () => {
        const port = (this.server.server.address() as AddressInfo).port;
        this.logger.log(`Catching outgoing e-mail on 127.0.0.1:${port} (no SMTP_URL set).`);
        resolve(port);
      });
    });
  }

  // Refuses the next `count` messages whose subject contains `match` with 451, as a busy server would.
  failNext(count: number, match = ''): void {
    this.failuresLeft = count;
    this.failMatch = match;
  }

  list(): CaughtMail[] {
    return [...this.messages];
  }

  close(): Promise<void> {
    return new Promise((resolve) => this.server.close(() => resolve()));
  }
}
