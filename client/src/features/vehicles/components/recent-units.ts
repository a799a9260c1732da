const STORAGE_KEY = 'yardcall.recent-units';
const KEEP = 8;

// Units this device picked last, newest first: a driver usually takes the same few trucks.
export function readRecentUnitIds(): string[] {
  try {
    const parsed: unknown = JSON.parse(localStorage.getItem(STORAGE_KEY) ?? '[]');
    return Array.isArray(parsed) ? parsed.filter((id): id is string => typeof id === 'string') : [];
  } catch {
    return [];
  }
}

export function rememberRecentUnit(id: string): string[] {
  const next = [id, ...readRecentUnitIds().filter((existing) => existing !== id)].slice(0, KEEP);
  localStorage.setItem(STORAGE_KEY, JSON.stringify(next));
  return next;
}

export function sortRecentFirst<T extends { id: string; unitNumber: string }>(items: T[], recentIds: string[]): T[] {
  const rank = (id: string) => {
    const at = recentIds.indexOf(id);
    return at === -1 ? Number.MAX_SAFE_INTEGER : at;
  };
  return [...items].sort(
    (a, b) => rank(a.id) - rank(b.id) || a.unitNumber.localeCompare(b.unitNumber, undefined, { numeric: true }),
  );
}
