/** One field a merge changes. */
export type FieldChange = { field: string; from: unknown; to: unknown };

/** What merging a partial table into the current one does, row by row. */
export type RowMerge<R> = {
  /** The current rows with each incoming row replacing the row of the same key, new keys appended. */
  rows: R[];
  added: string[];
  changed: { key: string; fields: FieldChange[] }[];
  /** Keys of incoming rows identical to the current ones. */
  unchanged: string[];
};

/**
 * Merges a partial table (for example an imported CSV of a few materials) into the current table
 * by key: rows not in the partial table are kept as they are, so a merge never removes a row.
 * Shared by the factor and rate tables.
 */
export function mergeRows<R extends Record<string, unknown>>(current: readonly R[], incoming: readonly R[], keyField: keyof R & string): RowMerge<R> {
  const byKey = new Map(incoming.map((r) => [String(r[keyField]), r]));
  const known = new Set(current.map((r) => String(r[keyField])));
  const changed: RowMerge<R>["changed"] = [];
  const unchanged: string[] = [];
  const rows = current.map((row) => {
    const key = String(row[keyField]);
    const next = byKey.get(key);
    if (!next) return row;
    const fields = Object.keys({ ...row, ...next })
      .filter((f) => !Object.is(row[f], next[f]))
      .map((f) => ({ field: f, from: row[f], to: next[f] }));
    if (fields.length === 0) unchanged.push(key);
    else changed.push({ key, fields });
    return next;
  });
  const added = incoming.filter((r) => !known.has(String(r[keyField])));
  return { rows: [...rows, ...added], added: added.map((r) => String(r[keyField])), changed, unchanged };
}

/**
 * The name a table set takes after an import: `file.csv, imported 2026-12-02`, or after a merge
 * `file.csv, merged 2026-12-02 into <previous name>`; at most `max` characters (cut with "…").
 */
export function importedSetName(fileName: string, isoDate: string, mergedInto: string | null = null, max = 120): string {
  const file = fileName.length > 60 ? `${fileName.slice(0, 59)}…` : fileName;
  const name = mergedInto === null ? `${file}, imported ${isoDate}` : `${file}, merged ${isoDate} into ${mergedInto}`;
  return name.length > max ? `${name.slice(0, max - 1)}…` : name;
}
