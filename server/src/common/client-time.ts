import { CLIENT_CLOCK_SKEW_MS, OFFLINE_WINDOW_DAYS, OFFLINE_WINDOW_MS } from '@yardcall/shared';
import { ValidateBy, type ValidationArguments } from 'class-validator';

const SKEW_MINUTES = CLIENT_CLOCK_SKEW_MS / 60_000;

// Only for ISO texts the type check already accepted; anything else is that check's to refuse.
function timeOf(value: unknown): number | null {
  if (typeof value !== 'string') return null;
  const time = Date.parse(value);
  return Number.isNaN(time) ? null : time;
}

// A time a phone sends may be at most CLIENT_CLOCK_SKEW_MS ahead of the server's clock.
export function NotInTheFuture(): PropertyDecorator {
  return ValidateBy({
    name: 'notInTheFuture',
    validator: {
      validate: (value: unknown) => {
        const time = timeOf(value);
        return time === null || time <= Date.now() + CLIENT_CLOCK_SKEW_MS;
      },
      defaultMessage: (args?: ValidationArguments) =>
        `${args?.property ?? 'This time'} is in the future by the server's clock (more than ${SKEW_MINUTES} minutes ahead): check the phone's date and time.`,
    },
  });
}

// A start may be at most OFFLINE_WINDOW_DAYS old: the longest a walk-around may wait offline to sync.
export function WithinOfflineWindow(): PropertyDecorator {
  return ValidateBy({
    name: 'withinOfflineWindow',
    validator: {
      validate: (value: unknown) => {
        const time = timeOf(value);
        return time === null || time >= Date.now() - OFFLINE_WINDOW_MS;
      },
      defaultMessage: (args?: ValidationArguments) =>
        `${args?.property ?? 'This time'} is more than ${OFFLINE_WINDOW_DAYS} days ago, longer than a walk-around may wait offline: check the phone's date and time, or start a new walk-around.`,
    },
  });
}
