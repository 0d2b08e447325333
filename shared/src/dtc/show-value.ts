/**
 * Renders any value for an error message. `String(x)` itself can throw (objects without a
 * prototype, a throwing `toString`), and an error path must never throw.
 */
export function showValue(value: unknown): string {
  if (typeof value === 'string') return JSON.stringify(value);
  if (typeof value === 'number' || typeof value === 'bigint' || typeof value === 'boolean') {
    return String(value);
  }
  if (value === null) return 'null';
  if (value === undefined) return 'undefined';
  return `a value of type ${typeof value}`;
}
