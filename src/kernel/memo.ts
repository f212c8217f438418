// Remembering the last few answers of a pure function whose arguments are small plain data (a brief,
// say): the proportion search designs dozens of candidates per span that share most of their inputs,
// and the same load basis would otherwise be rebuilt for each.

/**
 * `fn` remembering its last `size` answers, looked up by `keyOf(...args)` (a string that must differ
 * whenever the answer could). The answer returned is shared between callers: read only.
 */
export function memoLast<A extends unknown[], R>(fn: (...args: A) => R, keyOf: (...args: A) => string, size = 32): (...args: A) => R {
  const cache = new Map<string, R>();
  return (...args: A): R => {
    const key = keyOf(...args);
    const known = cache.get(key);
    if (known !== undefined) {
      // most recently used last, so the oldest is the first to go
      cache.delete(key);
      cache.set(key, known);
      return known;
    }
    const value = fn(...args);
    if (cache.size >= size) cache.delete(cache.keys().next().value as string);
    cache.set(key, value);
    return value;
  };
}

/** `fn` of one object remembering its answer for as long as that object lives (the object must not change). */
export function memoOnObject<O extends object, R>(fn: (o: O) => R): (o: O) => R {
  const cache = new WeakMap<O, R>();
  return (o: O): R => {
    if (cache.has(o)) return cache.get(o) as R;
    const value = fn(o);
    cache.set(o, value);
    return value;
  };
}

/**
 * JSON of plain data with every object's keys in sorted order (arrays keep theirs): the same text for
 * the same content however it was built, for keys of memories that outlive the page (a study read
 * back from storage or a link may list its fields in another order).
 */
export function canonicalJson(value: unknown): string {
  return JSON.stringify(value, (_key, v: unknown) =>
    v !== null && typeof v === "object" && !Array.isArray(v) ? Object.fromEntries(Object.entries(v as Record<string, unknown>).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))) : v,
  );
}
