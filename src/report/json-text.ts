/**
 * JSON text that stays readable for long coefficient lists: objects and arrays are
 * expanded one entry per line down to `depth`, and written compactly below it.
 */
export function jsonText(value: unknown, depth = 2, indent = ''): string {
  if (depth <= 0 || value === null || typeof value !== 'object') return JSON.stringify(value);
  const inner = `${indent}  `;
  if (Array.isArray(value)) {
    if (value.length === 0) return '[]';
    return `[\n${value.map((v) => inner + jsonText(v, depth - 1, inner)).join(',\n')}\n${indent}]`;
  }
  const entries = Object.entries(value as Record<string, unknown>).filter(([, v]) => v !== undefined);
  if (entries.length === 0) return '{}';
  return `{\n${entries.map(([k, v]) => `${inner}${JSON.stringify(k)}: ${jsonText(v, depth - 1, inner)}`).join(',\n')}\n${indent}}`;
}
