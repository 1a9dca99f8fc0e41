/**
 * A copy of plain data (objects, arrays, numbers, strings, booleans) with every -0 made 0, so that
 * the typed results and their JSON form (which cannot hold -0) are equal value for value.
 */
export function withoutNegativeZero<T>(value: T): T {
  if (typeof value === "number") return (value === 0 ? 0 : value) as T;
  if (Array.isArray(value)) return value.map(withoutNegativeZero) as T;
  if (typeof value === "object" && value !== null) {
    return Object.fromEntries(Object.entries(value).map(([k, v]) => [k, withoutNegativeZero(v)])) as T;
  }
  return value;
}
