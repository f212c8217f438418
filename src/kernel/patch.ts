/** Immutable update helpers for plain-data studies: untouched branches keep their identity. */

type Path = readonly (string | number)[];

/** A copy of `root` with the value at `path` replaced; every object not on the path is shared. */
export function setIn<T>(root: T, path: Path, value: unknown): T {
  if (path.length === 0) return value as T;
  const [head, ...rest] = path as [string | number, ...(string | number)[]];
  const container = root as unknown as Record<string | number, unknown> | unknown[];
  const current = (container as Record<string | number, unknown>)[head];
  const next = setIn(current, rest, value);
  if (Object.is(next, current)) return root;
  if (Array.isArray(container)) {
    const copy = container.slice();
    copy[head as number] = next;
    return copy as unknown as T;
  }
  return { ...(container as object), [head]: next } as T;
}

/** The value at `path`, or undefined. */
export function getIn(root: unknown, path: Path): unknown {
  let node = root;
  for (const key of path) {
    if (node === null || typeof node !== "object") return undefined;
    node = (node as Record<string | number, unknown>)[key];
  }
  return node;
}

/**
 * What differs between `base` and `value`, as a partial object of changed leaves (arrays are
 * compared whole). `mergeDiff(base, diff(base, value))` gives back `value`.
 */
export function diff(base: unknown, value: unknown): unknown {
  if (isPlainObject(base) && isPlainObject(value)) {
    const out: Record<string, unknown> = {};
    for (const key of Object.keys(value)) {
      if (!(key in base)) {
        out[key] = value[key];
        continue;
      }
      const d = diff(base[key], value[key]);
      if (d !== undefined) out[key] = d;
    }
    return Object.keys(out).length > 0 ? out : undefined;
  }
  return JSON.stringify(base) === JSON.stringify(value) ? undefined : value;
}

/** Applies a diff made by `diff` to its base. */
export function mergeDiff(base: unknown, patch: unknown): unknown {
  if (patch === undefined) return base;
  if (isPlainObject(base) && isPlainObject(patch)) {
    const out: Record<string, unknown> = { ...base };
    for (const key of Object.keys(patch)) out[key] = mergeDiff(base[key], patch[key]);
    return out;
  }
  return patch;
}

function isPlainObject(x: unknown): x is Record<string, unknown> {
  return typeof x === "object" && x !== null && !Array.isArray(x);
}

/** Whether two plain-data values are equal, whatever the order of their keys (a study read back from storage may order them differently). */
export function sameValue(a: unknown, b: unknown): boolean {
  if (Object.is(a, b)) return true;
  if (Array.isArray(a) || Array.isArray(b)) {
    return Array.isArray(a) && Array.isArray(b) && a.length === b.length && a.every((x, i) => sameValue(x, b[i]));
  }
  if (!isPlainObject(a) || !isPlainObject(b)) return false;
  const keys = Object.keys(a);
  return keys.length === Object.keys(b).length && keys.every((k) => k in b && sameValue(a[k], b[k]));
}
