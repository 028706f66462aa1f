// A Map with a size cap that evicts its oldest entry, so memos cannot grow without bound.

export class BoundedMemo<K, V> {
  private readonly map = new Map<K, V>();

  constructor(readonly capacity: number) {
    if (!(capacity >= 1)) throw new RangeError('capacity must be at least 1');
  }

  get size(): number {
    return this.map.size;
  }

  get(key: K): V | undefined {
    return this.map.get(key);
  }

  set(key: K, value: V): void {
    if (!this.map.has(key) && this.map.size >= this.capacity) {
      // Map iterates in insertion order: the first key is the oldest.
      const oldest = this.map.keys().next();
      if (!oldest.done) this.map.delete(oldest.value);
    }
    this.map.set(key, value);
  }

  clear(): void {
    this.map.clear();
  }
}
