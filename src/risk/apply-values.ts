/** A key of a resolved path: an object key or an array index (rows picked by id are resolved first). */
type PathStep = string | number;

/** Paths prepared for applyValues: each container on the paths once, parents before children. */
export type CompiledPaths = {
  /** Containers to copy: the parent's index in this list (−1: the root) and the key under it. */
  containers: { parent: number; key: PathStep }[];
  /** Per path: the container it writes into and the last key. */
  targets: { container: number; key: PathStep }[];
};

/** Prepares paths for applyValues (each container on the paths listed once). */
export function compilePaths(paths: readonly (readonly PathStep[])[]): CompiledPaths {
  const containers: CompiledPaths["containers"] = [];
  const index = new Map<string, number>();
  const targets = paths.map((path) => {
    let parent = -1;
    let prefix = "";
    for (let d = 0; d < path.length - 1; d++) {
      const key = path[d] as PathStep;
      prefix += `\u0000${typeof key}:${String(key)}`;
      let c = index.get(prefix);
      if (c === undefined) {
        c = containers.push({ parent, key }) - 1;
        index.set(prefix, c);
      }
      parent = c;
    }
    return { container: parent, key: path[path.length - 1] as PathStep };
  });
  return { containers, targets };
}

function shallowCopy(x: unknown): Record<PathStep, unknown> {
  return (Array.isArray(x) ? x.slice() : { ...(x as object) }) as Record<PathStep, unknown>;
}

/**
 * A copy of `root` with each path set to its value, as repeated setIn would give (every object not
 * on a path is shared), but copying each container once however many paths pass through it.
 * Paths are not checked here (checkRiskInputs does that before a run).
 * @param paths the paths, or compilePaths(paths) when the same paths are applied many times
 */
export function applyValues<T>(root: T, paths: readonly (readonly PathStep[])[] | CompiledPaths, values: ArrayLike<number>): T {
  const compiled = Array.isArray(paths) ? compilePaths(paths) : (paths as CompiledPaths);
  if (compiled.targets.length === 0) return root;
  const top = shallowCopy(root);
  const copies: Record<PathStep, unknown>[] = [];
  for (const { parent, key } of compiled.containers) {
    const holder = parent < 0 ? top : (copies[parent] as Record<PathStep, unknown>);
    const copy = shallowCopy(holder[key]);
    holder[key] = copy;
    copies.push(copy);
  }
  compiled.targets.forEach(({ container, key }, k) => {
    (container < 0 ? top : (copies[container] as Record<PathStep, unknown>))[key] = values[k];
  });
  return top as T;
}
