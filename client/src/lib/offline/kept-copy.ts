import { ApiError, NETWORK_ERROR_STATUS } from '../api-client';
import { getOfflineRuntime } from './offline-runtime';

// Server data as the driver sees it: fresh when the server answers, else the phone's last copy.
export interface KeptCopy<T> {
  data: T;
  // When the copy was fetched from the server.
  savedAt: string;
  // True when the server could not be reached and the phone's copy is shown.
  fromPhone: boolean;
}

// Fetches and keeps a copy under `key`; with no answer from the server, the kept copy (if it has
// the expected shape). Any other failure is the caller's to show.
export async function fetchKeepingCopy<T>(
  key: string,
  fetchFresh: () => Promise<T>,
  isValid: (value: unknown) => value is T,
): Promise<KeptCopy<T>> {
  const { store } = getOfflineRuntime();
  try {
    const data = await fetchFresh();
    const entry = await store.saveCached(key, data);
    return { data, savedAt: entry.savedAt, fromPhone: false };
  } catch (error) {
    if (!(error instanceof ApiError && error.status === NETWORK_ERROR_STATUS)) throw error;
    const kept = await readKeptCopy(key, isValid);
    if (!kept) throw error;
    return kept;
  }
}

// The phone's copy alone, without asking the server.
export async function readKeptCopy<T>(
  key: string,
  isValid: (value: unknown) => value is T,
): Promise<KeptCopy<T> | null> {
  const kept = await getOfflineRuntime().store.readCached(key);
  return kept && isValid(kept.value) ? { data: kept.value, savedAt: kept.savedAt, fromPhone: true } : null;
}
