import { HttpException, HttpStatus, Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { AppEnv } from '../config/env.validation';

const WINDOW_MS = 60_000;
// One client may fail this many times the per-address limit in a window: a yard tablet shared by a
// crew makes typing mistakes for several people, a script guessing across addresses makes many more.
const CLIENT_FACTOR = 4;
// Forget quiet keys once the map grows past this, so guessing cannot fill the memory.
const SWEEP_ABOVE = 10_000;

// Failed sign-ins counted over the last minute, per e-mail address and per client address. A success
// clears its e-mail address's count (the client's stays: a right guess is no reason to forget the
// wrong ones). @nestjs/throttler counts every request and cannot forget on success, so this is ours.
@Injectable()
export class LoginLimiter {
  private readonly failures = new Map<string, number[]>();
  private readonly addressLimit: number;
  private readonly clientLimit: number;

  constructor(config: ConfigService<AppEnv, true>) {
    this.addressLimit = config.get('THROTTLE_LOGIN_LIMIT', { infer: true });
    this.clientLimit = this.addressLimit * CLIENT_FACTOR;
  }

  // Throws 429 with the wait when either count is at its limit; checked before the password is.
  assertAllowed(client: string, email: string, now = Date.now()): void {
    const address = this.recent(addressKey(email), now);
    if (address.length >= this.addressLimit) {
      throw tooMany('for this e-mail address', waitSeconds(address, now));
    }
    const fromClient = this.recent(clientKey(client), now);
    if (fromClient.length >= this.clientLimit) {
      throw tooMany('from this device or network', waitSeconds(fromClient, now));
    }
  }

  recordFailure(client: string, email: string, now = Date.now()): void {
    if (this.failures.size > SWEEP_ABOVE) this.sweep(now);
    for (const key of [addressKey(email), clientKey(client)]) {
      this.failures.set(key, [...this.recent(key, now), now]);
    }
  }

  recordSuccess(email: string): void {
    this.failures.delete(addressKey(email));
  }

  private recent(key: string, now: number): number[] {
    return (this.failures.get(key) ?? []).filter((time) => time > now - WINDOW_MS);
  }

  private sweep(now: number): void {
    for (const key of [...this.failures.keys()]) {
      if (this.recent(key, now).length === 0) this.failures.delete(key);
    }
  }
}

function addressKey(email: string): string {
  return `address:${email.trim().toLowerCase()}`;
}

function clientKey(client: string): string {
  return `client:${client}`;
}

// Until the oldest counted failure leaves the window.
function waitSeconds(times: readonly number[], now: number): number {
  return Math.max(1, Math.ceil(((times[0] ?? now) + WINDOW_MS - now) / 1000));
}

function tooMany(scope: string, seconds: number): HttpException {
  return new HttpException(
    {
      message: `Too many sign-in attempts ${scope}. Try again in ${seconds} second${seconds === 1 ? '' : 's'}.`,
      retryAfterSeconds: seconds,
    },
    HttpStatus.TOO_MANY_REQUESTS,
  );
}
