/** AST values without their spans, for assertions about structure. */
export function stripSpans(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(stripSpans);
  if (typeof value !== 'object' || value === null) return value;
  const out: Record<string, unknown> = {};
  for (const [k, v] of Object.entries(value)) if (k !== 'span') out[k] = stripSpans(v);
  return out;
}
