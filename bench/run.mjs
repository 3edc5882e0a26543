#!/usr/bin/env node
/**
 * Benchmarks of the series engine (`npm run bench` builds first, then runs this file
 * against ../dist). Never run by `npm test`.
 *
 *   node bench/run.mjs [W1 W2 …] [--quick]
 *   node bench/run.mjs --single W1:modular   (one run; prints {workload, ms, sum, wsum, maxRssMB})
 *
 * Every selected workload (default: all, see workloads.mjs) runs by each of its routes —
 * the modular back-end (residues, majorants, CRT back to exact JSBI values) and the exact
 * engine — and each run builds fresh sources and expands from scratch:
 *   bestMs   — best of 5 in-process runs (performance.now around the expansion only),
 *              after untimed warm-up runs of the same workload and route for at least
 *              WARM_UP_MS (V8 compiles hot code only after it has run a while; the
 *              reference times are of compiled code, and the cold cost is medianMs);
 *   medianMs — median of 5 child processes `--single`, each timing one cold run itself;
 *   maxRssMB — the largest resident set of those child processes (whole process).
 * Checksums (checksum.mjs) of every run and route must agree, or the bench fails.
 * Writes bench/results.md and bench/results.json (only the workloads run).
 * `--quick`: one in-process run each, no child processes, no files written (smoke run).
 */
import { spawnSync } from 'node:child_process';
import { writeFileSync, renameSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { rat, radd, rcmp, req, sliceExponent } from '../dist/series/index.js';
import { WORKLOADS, workloadByName } from './workloads.mjs';
import { seriesChecksum } from './checksum.mjs';
import { COLLECTIONS, runCollectionOnce } from './collection.mjs';

const RUNS = 5;
/** Untimed runs of a workload before its timed ones: at least 3, and at least this long in all. */
const WARM_UP_MS = 500;
const SELF = fileURLToPath(import.meta.url);
const RESULTS_MD = new URL('./results.md', import.meta.url);
const RESULTS_JSON = new URL('./results.json', import.meta.url);

function parseArgs(argv) {
  const opts = { quick: false, single: null, names: [] };
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i];
    if (a === '--quick') opts.quick = true;
    else if (a === '--single') {
      opts.single = argv[++i];
      if (opts.single === undefined) throw new Error('--single needs a workload name');
    } else if (a.startsWith('--')) throw new Error(`unknown option ${a}`);
    else opts.names.push(a);
  }
  return opts;
}

/** The slice index of q^x in a series (x on its grid). */
function sliceIndexOf(series, x) {
  for (let i = 0; i < series.slices.length; i++) if (rcmp(sliceExponent(series, i), x) === 0) return i;
  throw new Error('k origin is not on the series grid');
}

/** Times one fresh expansion and checks it is the series asked for. */
function runOnce(w, route) {
  const t0 = performance.now();
  const series = w.build(route);
  const ms = performance.now() - t0;
  w.verify?.(series);
  const origin = w.kOrigin === undefined ? null : sliceIndexOf(series, w.kOrigin);
  const { sum, wsum, leadIndex } = seriesChecksum(series, origin);
  const want = radd(w.lead, rat(w.steps));
  if (!req(series.exactTo, want)) throw new Error(`${w.name}: expanded to the wrong q-order`);
  if (leadIndex < 0 || rcmp(sliceExponent(series, leadIndex), w.lead) !== 0) {
    throw new Error(`${w.name}: leading q-power is not the expected one`);
  }
  return { ms, sum, wsum };
}

function runChild(name, route) {
  const r = spawnSync(process.execPath, [SELF, '--single', `${name}:${route}`], { encoding: 'utf8', maxBuffer: 1 << 20 });
  if (r.status !== 0) throw new Error(`child --single ${name}:${route} failed (${r.status ?? r.signal}):\n${r.stderr}`);
  const lines = r.stdout.trim().split('\n');
  return JSON.parse(lines[lines.length - 1]);
}

function median(xs) {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 === 1 ? s[m] : (s[m - 1] + s[m]) / 2;
}

function sameChecksums(w, a, b, where) {
  if (a.sum !== b.sum || a.wsum !== b.wsum) {
    throw new Error(`${w.name}: checksums differ between runs (${where}): ${JSON.stringify(a)} vs ${JSON.stringify(b)}`);
  }
}

function warmUp(w, route) {
  const t0 = performance.now();
  for (let i = 0; i < 3 || performance.now() - t0 < WARM_UP_MS; i++) runOnce(w, route);
}

function benchWorkload(w, route, quick) {
  if (!quick) warmUp(w, route);
  const runs = [];
  for (let i = 0; i < (quick ? 1 : RUNS); i++) {
    runs.push(runOnce(w, route));
    sameChecksums(w, runs[0], runs[i], 'in-process');
  }
  const bestMs = Math.min(...runs.map((r) => r.ms));
  let medianMs = null;
  let maxRssMB = null;
  if (!quick) {
    const child = [];
    for (let i = 0; i < RUNS; i++) {
      const c = runChild(w.name, route);
      sameChecksums(w, runs[0], c, 'child process');
      child.push(c.ms);
      maxRssMB = Math.max(maxRssMB ?? 0, c.maxRssMB);
    }
    medianMs = median(child);
  }
  return {
    workload: w.name,
    route,
    bestMs: round(bestMs),
    medianMs: medianMs === null ? null : round(medianMs),
    sum: runs[0].sum,
    wsum: runs[0].wsum,
    maxRssMB: maxRssMB === null ? null : Math.round(maxRssMB),
    ...(w.referenceMs === undefined ? {} : { referenceMs: w.referenceMs, ratio: Math.round((bestMs / w.referenceMs) * 100) / 100 }),
  };
}

function round(ms) {
  return Math.round(ms * 10) / 10;
}

function markdown(results, totalMs) {
  const lines = [
    '# Benchmark results',
    '',
    `Node ${process.version}, ${process.platform}/${process.arch}; ${new Date().toISOString()}; whole bench ${(totalMs / 1000).toFixed(1)} s.`,
    `bestMs: best of ${RUNS} in-process runs, after untimed warm-up runs of the same workload (at least 3 and ${WARM_UP_MS} ms); medianMs: median of ${RUNS} child processes, each timing one cold run (its code not yet compiled).`,
    'Checksums are residues mod 2^61 − 1 (bench/checksum.mjs).',
    '',
    'route: `modular` = residues modulo word-size primes under the majorant height bound, then CRT to exact JSBI values (timed); `exact` = the JSBI engine.',
    'ratio: bestMs over the reference time of the issue (a C library, in-process); the aim is ≤ 4, the goal ≤ 2.',
    '',
    '| workload | series | route | bestMs | medianMs | ratio | maxRssMB | sum | wsum |',
    '|---|---|---|---:|---:|---:|---:|---:|---:|',
  ];
  for (const r of results) {
    const title = (WORKLOADS.find((x) => x.name === r.workload) ?? COLLECTIONS.find((x) => x.name === r.workload)).title;
    const dash = (x) => (x === null || x === undefined ? '—' : x);
    lines.push(
      `| ${r.workload} | ${title} | ${dash(r.route)} | ${r.bestMs.toFixed(1)} | ${r.medianMs === null ? '—' : r.medianMs.toFixed(1)} | ${dash(r.ratio)} | ${dash(r.maxRssMB)} | ${r.sum ?? '—'} | ${r.wsum ?? '—'} |`,
    );
  }
  return lines.join('\n') + '\n';
}

/** Writes via a temporary name and a rename, so a killed bench leaves no half file. */
function writeAtomic(url, text) {
  const path = fileURLToPath(url);
  writeFileSync(path + '.tmp', text);
  renameSync(path + '.tmp', path);
}

function main() {
  const opts = parseArgs(process.argv.slice(2));
  if (opts.single !== null) {
    const [name, route = 'exact'] = opts.single.split(':');
    const w = workloadByName(name);
    const r = runOnce(w, route);
    const maxRssMB = process.resourceUsage().maxRSS / 1024;
    process.stdout.write(JSON.stringify({ workload: w.name, route, ms: r.ms, sum: r.sum, wsum: r.wsum, maxRssMB }) + '\n');
    return;
  }
  const selected = opts.names.length === 0 ? WORKLOADS : opts.names.filter((n) => !COLLECTIONS.some((c) => c.name === n)).map(workloadByName);
  const t0 = performance.now();
  const results = [];
  for (const w of selected) {
    let first = null;
    for (const route of w.routes) {
      const r = benchWorkload(w, route, opts.quick);
      if (first !== null) sameChecksums(w, first, r, `route ${route} against ${first.route}`);
      first ??= r;
      results.push(r);
      console.log(`${r.workload} (${route}): best ${r.bestMs} ms, median (child) ${r.medianMs ?? '—'} ms, max RSS ${r.maxRssMB ?? '—'} MB, sum ${r.sum}, wsum ${r.wsum}`);
    }
  }
  const collections = opts.names.length === 0 ? COLLECTIONS : COLLECTIONS.filter((c) => opts.names.includes(c.name));
  for (const c of collections) {
    const times = [];
    for (let i = 0; i < (opts.quick ? 1 : RUNS); i++) times.push(runCollectionOnce(c));
    const r = { workload: c.name, route: null, bestMs: round(Math.min(...times)), medianMs: round(median(times)), sum: null, wsum: null, maxRssMB: null };
    results.push(r);
    console.log(`${r.workload}: best ${r.bestMs} ms, median ${r.medianMs} ms`);
  }
  const totalMs = performance.now() - t0;
  const md = markdown(results, totalMs);
  if (opts.quick) {
    console.log(`\n${md}\n(--quick: results files not written)`);
    return;
  }
  writeAtomic(RESULTS_JSON, JSON.stringify(results, null, 2) + '\n');
  writeAtomic(RESULTS_MD, md);
  console.log(`\n${md}`);
}

main();
