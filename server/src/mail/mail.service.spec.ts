import type { ConfigService } from '@nestjs/config';
import type { Repository } from 'typeorm';
import type { AppEnv } from '../config/env.validation';
import type { User } from '../users/entities/user.entity';
import { MailService } from './mail.service';

function serviceIn(nodeEnv: string): MailService {
  const values: Partial<Record<keyof AppEnv, unknown>> = { NODE_ENV: nodeEnv, SMTP_URL: null, MAIL_FROM: 'x@y.test' };
  const config = { get: (key: keyof AppEnv) => values[key] } as unknown as ConfigService<AppEnv, true>;
  return new MailService(config, {} as Repository<User>);
}

describe('MailService test hook', () => {
  const started: MailService[] = [];
  afterAll(async () => {
    for (const service of started) await service.onModuleDestroy();
  });

  it('refuses to fail sends on purpose outside test mode', async () => {
    const service = serviceIn('production');
    started.push(service);
    await service.onModuleInit();
    expect(() => service.failNextSends(1)).toThrow(/only in test mode/);
  });

  it('fails the next matching send with a temporary error, then delivers', async () => {
    const service = serviceIn('test');
    started.push(service);
    await service.onModuleInit();
    service.failNextSends(1, 'KV-9');
    await service.send({ to: 'a@b.test', subject: 'Other unit', text: 'not matched' });
    await expect(service.send({ to: 'a@b.test', subject: 'Unit KV-9', text: 'x' })).rejects.toThrow(/451|Try again/);
    await expect(service.send({ to: 'a@b.test', subject: 'Unit KV-9', text: 'x' })).resolves.toBeUndefined();
  });
});
