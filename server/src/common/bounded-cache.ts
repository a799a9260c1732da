// A Map that keeps at most `max` entries, dropping the oldest first: for values rebuilt from data
// that never changes (a checklist from its stored vehicle snapshot).
export class BoundedCache<K, V> {
  private readonly entries = new Map<K, V>();

  constructor(private readonly max: number) {}

  has(key: K): boolean {
    return this.entries.has(key);
  }

  get(key: K): V | undefined {
    return this.entries.get(key);
  }

  set(key: K, value: V): V {
    if (!this.entries.has(key) && this.entries.size >= this.max) {
      const oldest = this.entries.keys().next();
      if (!oldest.done) this.entries.delete(oldest.value);
    }
    this.entries.set(key, value);
    return value;
  }
}
