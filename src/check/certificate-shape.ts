/**
 * Whether a parsed JSON value has the shape of a certificate this version reads
 * (grammar/certificate.schema.json): `recheck` answers "unusable" (exit 2) for any
 * other shape before it re-derives anything. Only the structure is checked here;
 * whether the values are right is what `recheck` decides.
 */
import {
  type Certificate,
  CERTIFICATE_FORMAT,
  CERTIFICATE_FORMAT_VERSION,
  COEFFICIENT_LIST_NAME,
} from '../verdict/index.js';

class ShapeError extends Error {}

type Json = Record<string, unknown>;

function fail(path: string, what: string): never {
  throw new ShapeError(`${path}: ${what}`);
}

function object(v: unknown, path: string, required: readonly string[], optional: readonly string[] = []): Json {
  if (typeof v !== 'object' || v === null || Array.isArray(v)) fail(path, 'expected an object');
  const o = v as Json;
  for (const k of required) if (!(k in o)) fail(path, `missing "${k}"`);
  for (const k of Object.keys(o)) if (!required.includes(k) && !optional.includes(k)) fail(path, `unexpected "${k}"`);
  return o;
}

function string(v: unknown, path: string): string {
  if (typeof v !== 'string') fail(path, 'expected a string');
  return v;
}

function pattern(v: unknown, path: string, re: RegExp, what: string): void {
  if (!re.test(string(v, path))) fail(path, `expected ${what}`);
}

function integer(v: unknown, path: string, min: number): void {
  if (typeof v !== 'number' || !Number.isInteger(v) || v < min) fail(path, `expected an integer ≥ ${min}`);
}

function oneOf(v: unknown, path: string, allowed: readonly unknown[]): void {
  if (!allowed.includes(v)) fail(path, `expected one of ${allowed.map((a) => JSON.stringify(a)).join(', ')}`);
}

function array(v: unknown, path: string): unknown[] {
  if (!Array.isArray(v)) fail(path, 'expected an array');
  return v;
}

const RATIONAL = /^-?(0|[1-9][0-9]*)(\/[1-9][0-9]*)?$/;
const HEX64 = /^[0-9a-f]{64}$/;

function rational(v: unknown, path: string): void {
  pattern(v, path, RATIONAL, 'a rational "n" or "n/d"');
}

function index(v: unknown, path: string): void {
  if (typeof v === 'string') return rational(v, path);
  array(v, path).forEach((row, i) => array(row, `${path}[${i}]`).forEach((x, j) => rational(x, `${path}[${i}][${j}]`)));
}

function typeRecord(v: unknown, path: string): void {
  const o = object(v, path, ['class'], ['weight', 'index', 'multiplier']);
  oneOf(o['class'], `${path}.class`, ['modular', 'meromorphic', 'quasi']);
  if (o['weight'] !== undefined) rational(o['weight'], `${path}.weight`);
  if (o['index'] !== undefined) index(o['index'], `${path}.index`);
  if (o['multiplier'] !== undefined) pattern(o['multiplier'], `${path}.multiplier`, /^(trivial|eta\^[0-9]+)$/, '"trivial" or "eta^D"');
}

function side(v: unknown, path: string): void {
  const o = object(v, path, ['text', 'coefficient', 'factors']);
  string(o['text'], `${path}.text`);
  rational(o['coefficient'], `${path}.coefficient`);
  array(o['factors'], `${path}.factors`).forEach((f, i) => {
    const p = `${path}.factors[${i}]`;
    const fo = object(f, p, ['atom', 'exponent', 'type']);
    string(fo['atom'], `${p}.atom`);
    if (typeof fo['exponent'] !== 'number' || !Number.isInteger(fo['exponent'])) fail(`${p}.exponent`, 'expected an integer');
    typeRecord(fo['type'], `${p}.type`);
  });
}

function normalForm(v: unknown, path: string): void {
  const o = object(v, path, ['compared', 'left', 'right', 'type'], ['leftMultipliedBy', 'rightMultipliedBy']);
  oneOf(o['compared'], `${path}.compared`, ['sides', 'cross-multiplied']);
  for (const k of ['leftMultipliedBy', 'rightMultipliedBy']) if (o[k] !== undefined) string(o[k], `${path}.${k}`);
  side(o['left'], `${path}.left`);
  side(o['right'], `${path}.right`);
  typeRecord(o['type'], `${path}.type`);
}

function bound(v: unknown, path: string): void {
  const o = object(v, path, ['theorem', 'weight', 'index', 'qOrder', 'derivation', 'marginTo'], ['rank', 'rho']);
  oneOf(o['theorem'], `${path}.theorem`, ['A', 'B']);
  rational(o['weight'], `${path}.weight`);
  index(o['index'], `${path}.index`);
  if (o['rank'] !== undefined) integer(o['rank'], `${path}.rank`, 0);
  if (o['rho'] !== undefined) rational(o['rho'], `${path}.rho`);
  rational(o['qOrder'], `${path}.qOrder`);
  string(o['derivation'], `${path}.derivation`);
  rational(o['marginTo'], `${path}.marginTo`);
}

function comparison(v: unknown, path: string): void {
  const o = object(v, path, ['coefficients', 'digest']);
  integer(o['coefficients'], `${path}.coefficients`, 0);
  const d = object(o['digest'], `${path}.digest`, ['algorithm', 'list', 'value']);
  oneOf(d['algorithm'], `${path}.digest.algorithm`, ['sha256']);
  oneOf(d['list'], `${path}.digest.list`, [COEFFICIENT_LIST_NAME]);
  pattern(d['value'], `${path}.digest.value`, HEX64, '64 lower-case hex digits');
}

function routeOf(v: unknown): void {
  const head = object(v, 'route', ['route'], ['primes', 'heightBits']);
  oneOf(head['route'], 'route.route', ['exact', 'modular']);
  if (head['route'] === 'exact') {
    object(v, 'route', ['route']);
    return;
  }
  const r = object(v, 'route', ['route', 'primes', 'heightBits']);
  array(r['primes'], 'route.primes').forEach((p, i) => integer(p, `route.primes[${i}]`, 2));
  integer(r['heightBits'], 'route.heightBits', 0);
}

function certificate(v: unknown): Certificate {
  const o = object(
    v,
    'certificate',
    ['format', 'formatVersion', 'tool', 'claim', 'closure', 'verdict', 'assumptions', 'route'],
    ['type', 'normalForm', 'bound', 'comparison', 'reason'],
  );
  oneOf(o['format'], 'format', [CERTIFICATE_FORMAT]);
  oneOf(o['formatVersion'], 'formatVersion', [CERTIFICATE_FORMAT_VERSION]);
  const tool = object(o['tool'], 'tool', ['name', 'version']);
  oneOf(tool['name'], 'tool.name', ['sturmcheck']);
  string(tool['version'], 'tool.version');
  const claim = object(o['claim'], 'claim', ['name', 'file', 'line', 'relation', 'text', 'sha256']);
  for (const k of ['name', 'file', 'text']) string(claim[k], `claim.${k}`);
  integer(claim['line'], 'claim.line', 1);
  oneOf(claim['relation'], 'claim.relation', ['identity', 'type']);
  pattern(claim['sha256'], 'claim.sha256', HEX64, '64 lower-case hex digits');
  const closure = object(o['closure'], 'closure', ['text', 'sha256']);
  string(closure['text'], 'closure.text');
  pattern(closure['sha256'], 'closure.sha256', HEX64, '64 lower-case hex digits');
  oneOf(o['verdict'], 'verdict', ['proved']);
  array(o['assumptions'], 'assumptions').forEach((a, i) => string(a, `assumptions[${i}]`));
  if (o['type'] !== undefined) typeRecord(o['type'], 'type');
  if (o['normalForm'] !== undefined) normalForm(o['normalForm'], 'normalForm');
  if (o['bound'] !== undefined) bound(o['bound'], 'bound');
  routeOf(o['route']);
  if (o['comparison'] !== undefined) comparison(o['comparison'], 'comparison');
  if ((o['bound'] === undefined) !== (o['comparison'] === undefined)) fail('certificate', '"bound" and "comparison" come together');
  if (o['reason'] !== undefined) string(o['reason'], 'reason');
  return v as Certificate;
}

/** The certificate, or what is wrong with the shape (a path and the expectation). */
export function readCertificate(value: unknown): Certificate | string {
  try {
    return certificate(value);
  } catch (e) {
    if (e instanceof ShapeError) return e.message;
    throw e;
  }
}
