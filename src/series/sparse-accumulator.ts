/**
 * Accumulates terms c·ζ^e of a several-variable slice. Exponent vectors are packed into
 * one number (mixed radix with an offset) when every coordinate stays within ±maxAbs
 * and the packed range fits in 2^52; otherwise they are keyed by their text. Packing
 * avoids building a string per term in the products of theta leaves.
 */
import { JSBI, type Int, isZero } from './integer.js';
import type { SparseSlice } from './slice.js';

export class SparseAccumulator {
  private readonly n: number;
  private readonly radix: number;
  private readonly offset: number;
  private readonly packed: Map<number, { e: readonly number[]; v: Int }> | null;
  private readonly keyed: Map<string, { e: readonly number[]; v: Int }> | null;

  constructor(n: number, maxAbs: number) {
    this.n = n;
    this.offset = maxAbs;
    this.radix = 2 * maxAbs + 1;
    const fits = Math.pow(this.radix, n) < 2 ** 52;
    this.packed = fits ? new Map() : null;
    this.keyed = fits ? null : new Map();
  }

  add(e: readonly number[], v: Int): void {
    if (this.packed !== null) {
      let k = 0;
      for (let i = 0; i < this.n; i++) k = k * this.radix + (e[i]! + this.offset);
      const prev = this.packed.get(k);
      this.packed.set(k, prev === undefined ? { e, v } : { e: prev.e, v: JSBI.add(prev.v, v) });
      return;
    }
    const k = e.join(',');
    const prev = this.keyed!.get(k);
    this.keyed!.set(k, prev === undefined ? { e, v } : { e: prev.e, v: JSBI.add(prev.v, v) });
  }

  toSlice(): SparseSlice {
    const exps: (readonly number[])[] = [];
    const vals: Int[] = [];
    for (const { e, v } of (this.packed ?? this.keyed!).values()) {
      if (!isZero(v)) {
        exps.push(e);
        vals.push(v);
      }
    }
    return { kind: 'sparse', n: this.n, exps, vals };
  }
}
