/**
 * The catalogue row with this id (a fabric, a cladding…).
 * @throws RangeError naming the option, the value and what is allowed, when the catalogue has none
 */
export function findById<T extends { id: string }>(rows: readonly T[], id: string, option: string): T {
  const row = rows.find((r) => r.id === id);
  if (!row) throw new RangeError(`invalid ${option}: ${id} (expected one of ${rows.map((r) => r.id).join(", ")})`);
  return row;
}
