import { ApiError, NETWORK_ERROR_STATUS } from './api-client';
import { i18n } from './i18n';

// One sentence a person can act on, from whatever a call threw.
export function describeError(error: unknown): string {
  if (error instanceof ApiError) {
    if (error.status === NETWORK_ERROR_STATUS) return i18n.t('errors.network');
    if (error.status === 429) return i18n.t('errors.throttled');
    if (error.message) return error.message;
    return i18n.t('errors.unexpected');
  }
  return i18n.t('errors.unexpected');
}

export function fieldErrors(error: unknown): Record<string, string> {
  const byField: Record<string, string> = {};
  if (error instanceof ApiError) {
    for (const problem of error.fields) byField[problem.field] ??= problem.message;
  }
  return byField;
}
