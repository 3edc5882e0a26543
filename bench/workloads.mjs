/**
 * The benchmark workloads. Each `build(route)` constructs fresh sources (so no cache is
 * shared between runs) and expands to the requested q-order by the given route;
 * `lead` is the leading q-power and `steps` the number of integer q-steps past it, so
 * the series is asked for to q-order lead + steps. `referenceMs` is the time
 * for a C library of number theory on this machine.
 */
import { rat, radd, expandModular, powerSource, productSource, mapSource, substituteLinear, sumSource, scaleSeries, subtractSeries, isZeroSeries } from '../dist/series/index.js';
import { thetaSource, etaPowerSource, eisensteinSource } from '../dist/forms/leaves.js';
import { phiMinus2Source } from '../dist/forms/phi-m2-1.js';
import { phi0Source } from '../dist/forms/phi-0-1.js';

/** The workload's series to its q-order, by the exact engine or the modular route. */
function expandWorkload(w, route) {
  const X = radd(w.lead, rat(w.steps));
  if (route === 'exact') return w.source().expand(X);
  const m = expandModular(w.source(), X);
  if (m === null) throw new Error(`${w.name}: too high for the prime table`);
  return m.series;
}

export const WORKLOADS = [
  {
    name: 'W1',
    routes: ['modular', 'exact'],
    referenceMs: 13,
    title: 'Π(1−qⁿ)^24 to q^20000 (η^24 = q·Π(1−qⁿ)^24, 20000 steps past q^1)',
    lead: rat(1),
    steps: 20000,
    source() {
      return etaPowerSource(24);
    },
  },
  {
    name: 'W2',
    routes: ['modular', 'exact'],
    referenceMs: 1.9,
    title: 'ϑ(z)³ϑ(2z)³ϑ(3z)²ϑ(4z)ϑ(5z)/η⁶, 60 steps past q^1',
    lead: rat(1),
    steps: 60,
    source() {
      return productSource([
        powerSource(thetaSource(1), 3),
        powerSource(thetaSource(2), 3),
        powerSource(thetaSource(3), 2),
        thetaSource(4),
        thetaSource(5),
        etaPowerSource(-6),
      ]);
    },
  },
  {
    name: 'W3',
    routes: ['modular', 'exact'],
    referenceMs: 10,
    title: '(φ_{−2,1}·φ_{0,1})^6 to q^40',
    lead: rat(0),
    steps: 40,
    source() {
      return powerSource(productSource([phiMinus2Source(), phi0Source()]), 6);
    },
  },
  {
    name: 'W4',
    routes: ['modular', 'exact'],
    referenceMs: 48,
    title: 'E_4³ − E_6² to q^20000 (checked equal to 1728·Δ; k counted from q^0)',
    lead: rat(1),
    steps: 19999,
    kOrigin: rat(0),
    source() {
      return sumSource([
        { source: powerSource(eisensteinSource(4), 3), coefficient: rat(1) },
        { source: powerSource(eisensteinSource(6), 2), coefficient: rat(-1) },
      ]);
    },
    /** Not timed: the result must be 1728·Δ (Δ = η^24 by its own route). */
    verify(s) {
      const delta = scaleSeries(etaPowerSource(24).expand(rat(20000)), rat(1728));
      if (!isZeroSeries(subtractSeries(s, delta))) throw new Error('W4: E_4^3 - E_6^2 differs from 1728 Delta');
    },
  },
  {
    name: 'W5',
    // several variables: the modular back-end takes one variable
    routes: ['exact'],
    title: 'ϑ(z1)ϑ(z2)…ϑ(z8) in eight variables to q-order 6 (5 steps past q^1)',
    lead: rat(1),
    steps: 5,
    source() {
      const unit = (i) => Array.from({ length: 8 }, (_, j) => (i === j ? 1 : 0));
      return productSource(Array.from({ length: 8 }, (_, i) => mapSource(thetaSource(1), (s) => substituteLinear(s, [unit(i)]))));
    },
  },
];

for (const w of WORKLOADS) {
  w.build = (route = 'exact') => expandWorkload(w, route);
}

export function workloadByName(name) {
  const w = WORKLOADS.find((x) => x.name === name);
  if (w === undefined) throw new Error(`unknown workload ${name} (known: ${WORKLOADS.map((x) => x.name).join(', ')})`);
  return w;
}
