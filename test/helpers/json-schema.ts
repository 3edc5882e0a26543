/**
 * A validator for the subset of JSON Schema (draft 2020-12) that
 * grammar/certificate.schema.json uses: type, const, enum, pattern, minimum,
 * properties, required, additionalProperties (false or a schema), items, minItems,
 * dependentRequired, anyOf, and $ref to "#/$defs/…". Annotation keywords are
 * ignored; any other keyword throws, so the schema cannot silently use something this
 * validator does not check. Small enough to read, so no dependency is needed for it.
 */
type Schema = Record<string, unknown>;

const ANNOTATIONS = new Set(['$schema', '$id', 'title', 'description', '$comment', '$defs']);
const KNOWN = new Set([
  'type',
  'const',
  'enum',
  'pattern',
  'minimum',
  'properties',
  'required',
  'additionalProperties',
  'items',
  'minItems',
  'dependentRequired',
  'anyOf',
  '$ref',
]);

function typeOf(v: unknown): string {
  if (v === null) return 'null';
  if (Array.isArray(v)) return 'array';
  if (typeof v === 'number') return Number.isInteger(v) ? 'integer' : 'number';
  return typeof v;
}

function hasType(v: unknown, t: string): boolean {
  const actual = typeOf(v);
  return actual === t || (t === 'number' && actual === 'integer');
}

function resolveRef(root: Schema, ref: string): Schema {
  const m = /^#\/\$defs\/(.+)$/.exec(ref);
  const defs = root['$defs'] as Record<string, Schema> | undefined;
  const target = m === null ? undefined : defs?.[m[1]!];
  if (target === undefined) throw new Error(`unsupported or unknown $ref ${ref}`);
  return target;
}

function validateAt(root: Schema, schema: Schema, v: unknown, path: string, errors: string[]): void {
  for (const k of Object.keys(schema)) {
    if (!ANNOTATIONS.has(k) && !KNOWN.has(k)) throw new Error(`the test validator does not support the keyword ${k} (at ${path})`);
  }
  if (schema['$ref'] !== undefined) validateAt(root, resolveRef(root, schema['$ref'] as string), v, path, errors);
  if (schema['type'] !== undefined && !hasType(v, schema['type'] as string)) errors.push(`${path}: expected ${String(schema['type'])}, got ${typeOf(v)}`);
  if ('const' in schema && JSON.stringify(v) !== JSON.stringify(schema['const'])) errors.push(`${path}: expected ${JSON.stringify(schema['const'])}`);
  if (schema['enum'] !== undefined && !(schema['enum'] as unknown[]).some((e) => JSON.stringify(e) === JSON.stringify(v))) {
    errors.push(`${path}: not one of ${JSON.stringify(schema['enum'])}`);
  }
  if (schema['pattern'] !== undefined && typeof v === 'string' && !new RegExp(schema['pattern'] as string, 'u').test(v)) {
    errors.push(`${path}: ${JSON.stringify(v)} does not match ${String(schema['pattern'])}`);
  }
  if (schema['minimum'] !== undefined && typeof v === 'number' && v < (schema['minimum'] as number)) errors.push(`${path}: below the minimum`);
  if (schema['anyOf'] !== undefined) {
    const ok = (schema['anyOf'] as Schema[]).some((s) => {
      const inner: string[] = [];
      validateAt(root, s, v, path, inner);
      return inner.length === 0;
    });
    if (!ok) errors.push(`${path}: matches none of anyOf`);
  }
  if (Array.isArray(v) && typeof schema['minItems'] === 'number' && v.length < schema['minItems']) errors.push(`${path}: fewer than ${schema['minItems']} items`);
  if (Array.isArray(v) && schema['items'] !== undefined) v.forEach((x, i) => validateAt(root, schema['items'] as Schema, x, `${path}[${i}]`, errors));
  if (typeOf(v) !== 'object') return;
  const o = v as Record<string, unknown>;
  for (const k of (schema['required'] as string[] | undefined) ?? []) if (!(k in o)) errors.push(`${path}: missing ${k}`);
  const deps = (schema['dependentRequired'] as Record<string, string[]> | undefined) ?? {};
  for (const [k, needs] of Object.entries(deps)) if (k in o) for (const n of needs) if (!(n in o)) errors.push(`${path}: ${k} needs ${n}`);
  const props = (schema['properties'] as Record<string, Schema> | undefined) ?? {};
  for (const [k, x] of Object.entries(o)) {
    if (props[k] !== undefined) validateAt(root, props[k], x, `${path}.${k}`, errors);
    else if (schema['additionalProperties'] === false) errors.push(`${path}: unexpected property ${k}`);
    else if (typeof schema['additionalProperties'] === 'object') validateAt(root, schema['additionalProperties'] as Schema, x, `${path}.${k}`, errors);
  }
}

/** Every way `value` breaks `schema` (empty when it is valid). */
export function validateJson(schema: Schema, value: unknown): string[] {
  const errors: string[] = [];
  validateAt(schema, schema, value, '$', errors);
  return errors;
}
