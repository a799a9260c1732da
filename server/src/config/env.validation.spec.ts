import { Logger } from '@nestjs/common';
import { validateEnv } from './env.validation';

const DATABASE_URL = 'postgres://postgres@127.0.0.1:54400/yardcall';

// The development-secret warning is expected here; keep the test output readable.
beforeAll(() => {
  jest.spyOn(Logger.prototype, 'warn').mockImplementation(() => undefined);
  jest.spyOn(Logger.prototype, 'log').mockImplementation(() => undefined);
});

describe('validateEnv', () => {
  it('warns and uses a development secret when JWT_SECRET is missing outside production', () => {
    expect(validateEnv({ DATABASE_URL }).JWT_SECRET.length).toBeGreaterThan(16);
    expect(Logger.prototype.warn).toHaveBeenCalledWith(expect.stringContaining('JWT_SECRET is not set'));
  });

  it('fills in the defaults', () => {
    const env = validateEnv({ DATABASE_URL, CLIENT_DIST: '/nonexistent' });
    expect(env).toMatchObject({
      PORT: 3000,
      HOST: '127.0.0.1',
      JWT_TTL_SECONDS: 12 * 3600,
      PUBLIC_URL: 'http://127.0.0.1:3000',
      SMTP_URL: null,
      CLIENT_DIST: null,
      THROTTLE_LOGIN_LIMIT: 5,
    });
    expect(env.JWT_SECRET.length).toBeGreaterThan(16);
  });

  it('derives the public URL from PORT and trims a trailing slash from PUBLIC_URL', () => {
    expect(validateEnv({ DATABASE_URL, PORT: '8080' }).PUBLIC_URL).toBe('http://127.0.0.1:8080');
    expect(validateEnv({ DATABASE_URL, PUBLIC_URL: 'https://yard.example/' }).PUBLIC_URL).toBe('https://yard.example');
  });

  it.each([
    [{}, 'DATABASE_URL is required'],
    [{ DATABASE_URL: 'mysql://x' }, 'DATABASE_URL must start with postgres://'],
    [{ DATABASE_URL, PORT: '70000' }, 'PORT must be a whole number from 0 to 65535; it is "70000".'],
    [{ DATABASE_URL, JWT_TTL: 'forever' }, 'JWT_TTL must be seconds or a number with s, m, h or d'],
    [{ DATABASE_URL, NODE_ENV: 'production' }, 'JWT_SECRET is required when NODE_ENV is production'],
    [{ DATABASE_URL, NODE_ENV: 'production', JWT_SECRET: 'short' }, 'JWT_SECRET must be at least 32 characters'],
    [{ DATABASE_URL, SMTP_URL: 'http://mail' }, 'SMTP_URL must start with smtp:// or smtps://'],
    [{ DATABASE_URL, PUBLIC_URL: 'yard.example' }, 'PUBLIC_URL must be a URL'],
    [{ DATABASE_URL, THROTTLE_LOGIN_LIMIT: '0' }, 'THROTTLE_LOGIN_LIMIT must be a whole number from 1'],
    [{ DATABASE_URL, MAIL_FROM: 'nobody' }, 'MAIL_FROM must be an e-mail address'],
  ])('refuses %j with a sentence naming the variable', (raw, message) => {
    expect(() => validateEnv(raw)).toThrow(message);
  });

  it('converts JWT_TTL units to seconds', () => {
    expect(validateEnv({ DATABASE_URL, JWT_TTL: '90' }).JWT_TTL_SECONDS).toBe(90);
    expect(validateEnv({ DATABASE_URL, JWT_TTL: '15m' }).JWT_TTL_SECONDS).toBe(900);
    expect(validateEnv({ DATABASE_URL, JWT_TTL: '2d' }).JWT_TTL_SECONDS).toBe(172800);
  });
});
