export interface StorageRoom {
  usageBytes: number;
  quotaBytes: number;
  // Little room left: the driver is warned before a note or photo cannot be kept.
  short: boolean;
}

// Our own practice: warn with less than 50 MB free (about a dozen photos and a hundred voice notes)
// or past 90 % of what the browser grants.
export const STORAGE_SHORT_FREE_BYTES = 50 * 1024 * 1024;
export const STORAGE_SHORT_RATIO = 0.9;

// Null where the browser cannot tell (no StorageManager, or it refuses to estimate).
export async function estimateStorageRoom(
  storage: Pick<StorageManager, 'estimate'> | undefined = globalThis.navigator?.storage,
): Promise<StorageRoom | null> {
  if (!storage || typeof storage.estimate !== 'function') return null;
  try {
    const { usage, quota } = await storage.estimate();
    if (usage === undefined || quota === undefined || quota <= 0) return null;
    const short = quota - usage < STORAGE_SHORT_FREE_BYTES || usage / quota > STORAGE_SHORT_RATIO;
    return { usageBytes: usage, quotaBytes: quota, short };
  } catch {
    return null;
  }
}
