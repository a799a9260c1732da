import { Logger } from '@nestjs/common';
import { existsSync } from 'node:fs';
import { resolve } from 'node:path';

// The validated environment the app runs with; every value has been checked at boot.
export interface AppEnv {
  NODE_ENV: string;
  DATABASE_URL: string;
  PORT: number;
  HOST: string;
  JWT_SECRET: string;
  // JWT_TTL converted to seconds.
  JWT_TTL_SECONDS: number;
  PUBLIC_URL: string;
  SMTP_URL: string | null;
  MAIL_FROM: string;
  CLIENT_DIST: string | null;
  THROTTLE_LOGIN_LIMIT: number;
  // Where voice notes and photos are kept: a local folder unless an S3-compatible store is configured.
  STORAGE: StorageEnv;
}

export type StorageEnv =
  | { driver: 'local'; dir: string }
  | {
      driver: 's3';
      endpoint: string;
      bucket: string;
      region: string;
      accessKeyId: string;
      secretAccessKey: string;
    };

// Fixed so a development restart keeps sessions; production must set its own.
const DEV_JWT_SECRET = 'yardcall-dev-secret-not-for-production';

// Two levels up from src/config (sources) or dist/config (built) is the server package.
const SERVER_ROOT = resolve(__dirname, '..', '..');

export class EnvError extends Error {}

function readString(raw: Record<string, unknown>, name: string): string | undefined {
  const value = raw[name];
  if (value === undefined || value === null) return undefined;
  if (typeof value !== 'string') return typeof value === 'number' ? String(value) : undefined;
  const trimmed = value.trim();
  return trimmed === '' ? undefined : trimmed;
}

function readInt(raw: Record<string, unknown>, name: string, fallback: number, min: number, max: number): number {
  const text = readString(raw, name);
  if (text === undefined) return fallback;
  if (!/^\d+$/.test(text) || Number(text) < min || Number(text) > max) {
    throw new EnvError(`${name} must be a whole number from ${min} to ${max}; it is "${text}".`);
  }
  return Number(text);
}

function readUrl(raw: Record<string, unknown>, name: string, protocols: string[]): string | undefined {
  const text = readString(raw, name);
  if (text === undefined) return undefined;
  let url: URL;
  try {
    url = new URL(text);
  } catch {
    throw new EnvError(`${name} must be a URL (${protocols.join(' or ')}); "${text}" is not one.`);
  }
  if (!protocols.includes(url.protocol.replace(/:$/, ''))) {
    throw new EnvError(`${name} must start with ${protocols.map((p) => `${p}://`).join(' or ')}; it is "${text}".`);
  }
  return text;
}

const S3_REQUIRED = ['S3_ENDPOINT', 'S3_BUCKET', 'S3_ACCESS_KEY_ID', 'S3_SECRET_ACCESS_KEY'] as const;

// Any S3_* variable switches to the S3-compatible store, which then needs all four; else STORAGE_DIR.
export function readStorageEnv(raw: Record<string, unknown>): StorageEnv {
  const anyS3 = [...S3_REQUIRED, 'S3_REGION'].some((name) => readString(raw, name) !== undefined);
  if (!anyS3) {
    const dir = readString(raw, 'STORAGE_DIR');
    return { driver: 'local', dir: dir ? resolve(dir) : resolve(SERVER_ROOT, '..', '.data', 'objects') };
  }
  const missing = S3_REQUIRED.filter((name) => readString(raw, name) === undefined);
  if (missing.length > 0) {
    throw new EnvError(
      `An S3-compatible store needs ${S3_REQUIRED.join(', ')}; ${missing.join(', ')} ${missing.length === 1 ? 'is' : 'are'} not set.`,
    );
  }
  const bucket = readString(raw, 'S3_BUCKET') ?? '';
  // S3 bucket naming rules (AWS S3 User Guide, "Bucket naming rules"): 3-63 lowercase letters, digits, dots, hyphens.
  if (!/^[a-z0-9][a-z0-9.-]{1,61}[a-z0-9]$/.test(bucket)) {
    throw new EnvError(`S3_BUCKET must be 3 to 63 lowercase letters, digits, dots or hyphens; it is "${bucket}".`);
  }
  return {
    driver: 's3',
    endpoint: readUrl(raw, 'S3_ENDPOINT', ['http', 'https']) ?? '',
    bucket,
    region: readString(raw, 'S3_REGION') ?? 'us-east-1',
    accessKeyId: readString(raw, 'S3_ACCESS_KEY_ID') ?? '',
    secretAccessKey: readString(raw, 'S3_SECRET_ACCESS_KEY') ?? '',
  };
}

// Checks the process environment and fills in defaults; a bad value stops the boot with a sentence naming it.
export function validateEnv(raw: Record<string, unknown>): AppEnv {
  const nodeEnv = readString(raw, 'NODE_ENV') ?? 'development';
  const databaseUrl = readUrl(raw, 'DATABASE_URL', ['postgres', 'postgresql']);
  if (!databaseUrl) {
    throw new EnvError('DATABASE_URL is required, e.g. postgres://postgres@127.0.0.1:54400/yardcall.');
  }
  const port = readInt(raw, 'PORT', 3000, 0, 65535);
  const host = readString(raw, 'HOST') ?? '127.0.0.1';

  let jwtSecret = readString(raw, 'JWT_SECRET');
  if (!jwtSecret) {
    if (nodeEnv === 'production') {
      throw new EnvError('JWT_SECRET is required when NODE_ENV is production: set a long random string.');
    }
    new Logger('Config').warn('JWT_SECRET is not set: using the development secret. Never do this in production.');
    jwtSecret = DEV_JWT_SECRET;
  } else if (nodeEnv === 'production' && jwtSecret.length < 32) {
    throw new EnvError('JWT_SECRET must be at least 32 characters in production.');
  }

  const jwtTtl = readString(raw, 'JWT_TTL') ?? '12h';
  const ttlMatch = /^(\d+)(s|m|h|d)?$/.exec(jwtTtl);
  if (!ttlMatch || Number(ttlMatch[1]) === 0) {
    throw new EnvError(`JWT_TTL must be seconds or a number with s, m, h or d (e.g. 12h); it is "${jwtTtl}".`);
  }
  const unitSeconds: Record<string, number> = { s: 1, m: 60, h: 3600, d: 86400 };
  const ttlUnitSeconds = unitSeconds[ttlMatch[2] ?? 's'] ?? 1;

  const publicUrl = (readUrl(raw, 'PUBLIC_URL', ['http', 'https']) ?? `http://127.0.0.1:${port}`).replace(/\/+$/, '');
  const smtpUrl = readUrl(raw, 'SMTP_URL', ['smtp', 'smtps']) ?? null;
  const mailFrom = readString(raw, 'MAIL_FROM') ?? 'Yardcall <no-reply@yardcall.test>';
  if (!/^(.*<)?[^\s@<>]+@[^\s@<>]+(>)?$/.test(mailFrom)) {
    throw new EnvError(
      `MAIL_FROM must be an e-mail address, optionally with a name ("Name <a@b.c>"); it is "${mailFrom}".`,
    );
  }

  const clientDistSetting = readString(raw, 'CLIENT_DIST');
  const clientDist = clientDistSetting ? resolve(clientDistSetting) : resolve(SERVER_ROOT, '..', 'client', 'dist');
  const clientDistUsable = existsSync(resolve(clientDist, 'index.html'));
  if (!clientDistUsable) {
    new Logger('Config').log(`No built client at ${clientDist}: serving the API only.`);
  }

  return {
    NODE_ENV: nodeEnv,
    DATABASE_URL: databaseUrl,
    PORT: port,
    HOST: host,
    JWT_SECRET: jwtSecret,
    JWT_TTL_SECONDS: Number(ttlMatch[1]) * ttlUnitSeconds,
    PUBLIC_URL: publicUrl,
    SMTP_URL: smtpUrl,
    MAIL_FROM: mailFrom,
    CLIENT_DIST: clientDistUsable ? clientDist : null,
    THROTTLE_LOGIN_LIMIT: readInt(raw, 'THROTTLE_LOGIN_LIMIT', 5, 1, 10000),
    STORAGE: readStorageEnv(raw),
  };
}
