/** A bounded map that forgets the least recently used entry first. */
export class LruCache<K, V> {
  private readonly entries = new Map<K, V>();

  constructor(readonly maxEntries: number) {
    if (!(maxEntries >= 1)) throw new RangeError("maxEntries must be at least 1");
  }

  get size(): number {
    return this.entries.size;
  }

  get(key: K): V | undefined {
    if (!this.entries.has(key)) return undefined;
    const value = this.entries.get(key) as V;
    // Re-inserting moves the key to the newest end of the Map's order.
    this.entries.delete(key);
    this.entries.set(key, value);
    return value;
  }

  set(key: K, value: V): void {
    this.entries.delete(key);
    this.entries.set(key, value);
    while (this.entries.size > this.maxEntries) {
      const oldest = this.entries.keys().next().value as K;
      this.entries.delete(oldest);
    }
  }

  delete(key: K): void {
    this.entries.delete(key);
  }

  clear(): void {
    this.entries.clear();
  }
}
