export type PersistOutcome = 'granted' | 'denied' | 'unsupported';

let asked: Promise<PersistOutcome> | null = null;

// Asks once per page: without persistence the browser may clear unsent answers under storage pressure.
export function requestPersistentStorage(
  storage: StorageManager | undefined = globalThis.navigator?.storage,
): Promise<PersistOutcome> {
  asked ??= (async (): Promise<PersistOutcome> => {
    if (!storage || typeof storage.persist !== 'function') return 'unsupported';
    try {
      if (typeof storage.persisted === 'function' && (await storage.persisted())) return 'granted';
      return (await storage.persist()) ? 'granted' : 'denied';
    } catch {
      return 'denied';
    }
  })();
  return asked;
}

// For tests: forget the answer so the next call asks again.
export function resetPersistentStorageRequest(): void {
  asked = null;
}
