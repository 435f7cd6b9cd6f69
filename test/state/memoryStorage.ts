/** A Storage in memory, optionally refusing writes (a full or blocked browser storage). */
export class MemoryStorage implements Storage {
  private items = new Map<string, string>();
  refuseWrites = false;
  get length() {
    return this.items.size;
  }
  clear() {
    this.items.clear();
  }
  getItem(k: string) {
    return this.items.has(k) ? this.items.get(k)! : null;
  }
  key(i: number) {
    return [...this.items.keys()][i] ?? null;
  }
  removeItem(k: string) {
    this.items.delete(k);
  }
  setItem(k: string, v: string) {
    // What browsers throw when the quota is used up; the old value stays.
    if (this.refuseWrites) throw new DOMException('The quota has been exceeded.', 'QuotaExceededError');
    this.items.set(k, String(v));
  }
  keys() {
    return [...this.items.keys()];
  }
}
