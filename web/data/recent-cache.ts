/**
 * The few most recently read values of something costly to read, by key. A read moves its key to
 * the newest end (a Map keeps insertion order), and past `capacity` the least recently read goes.
 */
export class RecentCache<T> {
  readonly #entries = new Map<string, T>();
  constructor(readonly capacity: number) {}

  /** The value of `key`, from `load` when it is not kept; undefined (and nothing kept) when `load` has none. */
  get(key: string, load: () => T | undefined): T | undefined {
    const hit = this.#entries.get(key);
    if (hit !== undefined) {
      this.#entries.delete(key);
      this.#entries.set(key, hit);
      return hit;
    }
    const value = load();
    if (value === undefined) return undefined;
    this.#entries.set(key, value);
    while (this.#entries.size > this.capacity)
      this.#entries.delete(this.#entries.keys().next().value as string);
    return value;
  }
}
