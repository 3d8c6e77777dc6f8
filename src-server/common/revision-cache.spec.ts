import { LruMap, RevisionCache, RevisionReader } from './revision-cache';

/** A promise settled from outside, to interleave "requests" by hand. */
function deferred<T>() {
  let resolve!: (value: T) => void;
  let reject!: (error: unknown) => void;
  const promise = new Promise<T>((ok, fail) => {
    resolve = ok;
    reject = fail;
  });
  return { promise, resolve, reject };
}

const settle = () => new Promise((done) => setImmediate(done));

describe('LruMap', () => {
  it('keeps at most its capacity, dropping the least recently used first', () => {
    const map = new LruMap<string, number>(2);
    map.set('a', 1).set('b', 2);
    expect(map.get('a')).toBe(1); // a is now younger than b
    map.set('c', 3);
    expect(map.size).toBe(2);
    expect(map.has('b')).toBe(false);
    expect([map.get('a'), map.get('c')]).toEqual([1, 3]);
  });

  it('refreshes a key on set, and refuses a capacity below 1', () => {
    const map = new LruMap<string, number>(2);
    map.set('a', 1).set('b', 2).set('a', 10).set('c', 3);
    expect(map.has('b')).toBe(false);
    expect(map.get('a')).toBe(10);
    expect(() => new LruMap(0)).toThrow(RangeError);
  });
});

describe('RevisionCache', () => {
  it('serves a value only at the revision it was stored under', () => {
    const cache = new RevisionCache<string>(10);
    expect(cache.set('part 1', 5, 'page at 5')).toBe(true);
    expect(cache.get('part 1', 5)).toBe('page at 5');
    expect(cache.get('part 1', 6)).toBeUndefined();
    // Revision 6 was seen: the value of 5 is gone for good, also for a late caller that read 5.
    expect(cache.get('part 1', 5)).toBeUndefined();
    expect(cache.size).toBe(0);
  });

  it('refuses to store a value of a revision older than one already seen', () => {
    const cache = new RevisionCache<string>(10);
    cache.get('part 1', 7);
    expect(cache.set('part 1', 6, 'page at 6')).toBe(false);
    expect(cache.get('part 1', 7)).toBeUndefined();
  });

  it('is bounded: the least recently used key leaves first', () => {
    const cache = new RevisionCache<number>(2);
    cache.set('a', 1, 1);
    cache.set('b', 1, 2);
    cache.get('a', 1);
    cache.set('c', 1, 3);
    expect([cache.get('a', 1), cache.get('b', 1), cache.get('c', 1)]).toEqual([1, undefined, 3]);
  });

  describe('the race: a compute that started at revision N ends after a write bumped it to N+1', () => {
    it('is not stored, and not served to a caller of N+1', async () => {
      const cache = new RevisionCache<string>(10);
      const slow = deferred<string>();
      const before = cache.getOrLoad('catalogue', 1, () => slow.promise);
      // Another request read revision 2 (a write landed) and loaded the new data.
      expect(await cache.getOrLoad('catalogue', 2, async () => 'data at 2')).toBe('data at 2');
      slow.resolve('data at 1');
      expect(await before).toBe('data at 1'); // its own caller still gets what it asked for
      expect(cache.get('catalogue', 2)).toBe('data at 2');
      let loads = 0;
      expect(await cache.getOrLoad('catalogue', 2, async () => `again ${++loads}`)).toBe('data at 2');
      expect(loads).toBe(0);
    });

    it('is not stored when no caller of N+1 stored anything yet', async () => {
      const cache = new RevisionCache<string>(10);
      const slow = deferred<string>();
      const before = cache.getOrLoad('catalogue', 1, () => slow.promise);
      const fresh = deferred<string>();
      const after = cache.getOrLoad('catalogue', 2, () => fresh.promise);
      slow.resolve('data at 1');
      await before;
      expect(cache.get('catalogue', 2)).toBeUndefined();
      fresh.resolve('data at 2');
      expect(await after).toBe('data at 2');
      expect(cache.get('catalogue', 2)).toBe('data at 2');
    });

    it('never hands a load in flight for N to a caller of N+1', async () => {
      const cache = new RevisionCache<string>(10);
      const slow = deferred<string>();
      const loads: number[] = [];
      const first = cache.getOrLoad('catalogue', 1, () => (loads.push(1), slow.promise));
      const sameRevision = cache.getOrLoad('catalogue', 1, async () => (loads.push(1), 'second load at 1'));
      const nextRevision = cache.getOrLoad('catalogue', 2, async () => (loads.push(2), 'data at 2'));
      slow.resolve('data at 1');
      expect(await Promise.all([first, sameRevision, nextRevision])).toEqual(['data at 1', 'data at 1', 'data at 2']);
      expect(loads).toEqual([1, 2]);
    });

    it('getOrCreate of an old revision gives a fresh value that nobody else gets', () => {
      const cache = new RevisionCache<object>(1);
      const current = cache.getOrCreate('facts', 2, () => ({ at: 2 }));
      const stale = cache.getOrCreate('facts', 1, () => ({ at: 1 }));
      expect(stale).toEqual({ at: 1 });
      expect(cache.getOrCreate('facts', 2, () => ({ at: 'new' }))).toBe(current);
    });
  });

  it('does not keep a failed load: the next caller loads again', async () => {
    const cache = new RevisionCache<string>(10);
    await expect(cache.getOrLoad('part 1', 1, () => Promise.reject(new Error('database gone')))).rejects.toThrow('database gone');
    await expect(
      cache.getOrLoad('part 1', 1, () => {
        throw new Error('thrown at once');
      }),
    ).rejects.toThrow('thrown at once');
    expect(await cache.getOrLoad('part 1', 1, async () => 'loaded')).toBe('loaded');
  });
});

describe('RevisionReader', () => {
  it('gives each caller a value read after its call began, sharing reads among callers that wait', async () => {
    const reads: ReturnType<typeof deferred<number>>[] = [];
    const reader = new RevisionReader(() => {
      const read = deferred<number>();
      reads.push(read);
      return read.promise;
    });
    const first = reader.current();
    await settle();
    // Both arrive while the first read runs (it may have started before their write): they share a new one.
    const second = reader.current();
    const third = reader.current();
    reads[0].resolve(1);
    expect(await first).toBe(1);
    await settle();
    expect(reads).toHaveLength(2);
    reads[1].resolve(2);
    expect(await Promise.all([second, third])).toEqual([2, 2]);
  });

  it('lets a failed read fail its callers only', async () => {
    let next: () => Promise<number> = () => Promise.reject(new Error('database gone'));
    const reader = new RevisionReader(() => next());
    await expect(reader.current()).rejects.toThrow('database gone');
    next = async () => 4;
    expect(await reader.current()).toBe(4);
  });
});
