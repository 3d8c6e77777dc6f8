/**
 * Caching in the server is one concept: a value derived from the database is stored under the key of
 * what it depends on AND the revision it was computed at, and is served only to a caller that read
 * that same revision. Every write that changes such a value bumps the revision in the database, so any
 * server process (not only the one that wrote) sees the change on its next read of the revision.
 *
 * Rules that keep a value from one revision out of another:
 * - read the revision BEFORE computing (data read afterwards is then at least that new);
 * - store under the revision read, and only while it is still the newest this cache has seen;
 * - a load in flight is shared only by callers of the same key and revision.
 *
 * Values keyed by their whole content (e.g. a hash of a rule list) never go stale and need only the
 * bounded LruMap. Memos of pure functions over immutable in-memory objects (WeakMaps in the engine and
 * the search index) are not caches of database state and cannot go stale: a reload replaces the object.
 */
import { LRUCache } from 'lru-cache';

/** A Map of at most `capacity` entries; the least recently used leaves first (lru-cache does the bookkeeping). */
export class LruMap<K extends NonNullable<unknown>, V extends NonNullable<unknown>> {
  private readonly entries: LRUCache<K, V>;

  constructor(readonly capacity: number) {
    if (!Number.isInteger(capacity) || capacity < 1) throw new RangeError(`capacity must be a positive integer, not ${capacity}`);
    this.entries = new LRUCache<K, V>({ max: capacity });
  }

  get size(): number {
    return this.entries.size;
  }

  has(key: K): boolean {
    return this.entries.has(key);
  }

  /** The value, now the most recently used. */
  get(key: K): V | undefined {
    return this.entries.get(key);
  }

  set(key: K, value: V): this {
    this.entries.set(key, value);
    return this;
  }

  delete(key: K): boolean {
    return this.entries.delete(key);
  }

  clear(): void {
    this.entries.clear();
  }
}

interface Stored<V> {
  readonly revision: number;
  readonly value: V;
}

/** Values derived from the database, keyed by what they depend on and the revision they were computed at. */
export class RevisionCache<V, K extends string | number = string> {
  private readonly entries: LruMap<K, Stored<V>>;
  /** Loads in flight, by revision then key: a caller of another revision never shares one. */
  private readonly loading = new Map<number, Map<K, Promise<V>>>();
  private newest = Number.NEGATIVE_INFINITY;

  constructor(capacity: number) {
    this.entries = new LruMap(capacity);
  }

  /** The newest revision any caller has passed; -Infinity before the first. */
  get revision(): number {
    return this.newest;
  }

  get size(): number {
    return this.entries.size;
  }

  /** Notes a revision a caller read; true when it is the newest. Entries of older revisions can never be served again. */
  private isNewest(revision: number): boolean {
    if (revision > this.newest) {
      this.newest = revision;
      this.entries.clear();
    }
    return revision === this.newest;
  }

  /** The value stored for `key` at exactly `revision`. */
  get(key: K, revision: number): V | undefined {
    if (!this.isNewest(revision)) return undefined;
    const stored = this.entries.get(key);
    return stored?.revision === revision ? stored.value : undefined;
  }

  /** Stores a value computed after reading `revision`; refused (false) once a newer revision has been seen. */
  set(key: K, revision: number, value: V): boolean {
    if (!this.isNewest(revision)) return false;
    this.entries.set(key, { revision, value });
    return true;
  }

  /** The stored value, or a new one from `create` (stored when `revision` is still the newest). */
  getOrCreate(key: K, revision: number, create: () => V): V {
    const stored = this.isNewest(revision) ? this.entries.get(key) : undefined;
    if (stored?.revision === revision) return stored.value;
    const value = create();
    this.set(key, revision, value);
    return value;
  }

  /** The stored value, or the result of `load`, shared with every caller of the same key and revision while it runs. */
  getOrLoad(key: K, revision: number, load: () => Promise<V>): Promise<V> {
    if (this.isNewest(revision)) {
      const stored = this.entries.get(key);
      if (stored?.revision === revision) return Promise.resolve(stored.value);
    }
    let flights = this.loading.get(revision);
    const running = flights?.get(key);
    if (running) return running;
    if (!flights) this.loading.set(revision, (flights = new Map()));
    const inFlight = flights;
    // Deferred by a microtask so that a synchronous throw in `load` still passes through the cleanup below.
    const flight = Promise.resolve()
      .then(load)
      .then((value) => {
        this.set(key, revision, value);
        return value;
      })
      .finally(() => {
        inFlight.delete(key);
        if (inFlight.size === 0 && this.loading.get(revision) === inFlight) this.loading.delete(revision);
      });
    inFlight.set(key, flight);
    return flight;
  }

  clear(): void {
    this.entries.clear();
  }
}

/**
 * Reads a revision so that each caller gets a value read after its call began (it sees its own writes);
 * callers arriving while a read runs share the next read instead of each sending their own.
 */
export class RevisionReader {
  private running: Promise<number> | null = null;
  private queued: Promise<number> | null = null;

  constructor(private readonly read: () => Promise<number>) {}

  current(): Promise<number> {
    if (!this.running) return this.start();
    const running = this.running;
    this.queued ??= running.then(noop, noop).then(() => {
      this.queued = null;
      return this.start();
    });
    return this.queued;
  }

  private start(): Promise<number> {
    const read = Promise.resolve().then(() => this.read());
    this.running = read;
    const done = () => {
      if (this.running === read) this.running = null;
    };
    read.then(done, done);
    return read;
  }
}

const noop = () => undefined;
