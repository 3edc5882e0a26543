/**
 * Accumulates the products of several-variable slices. Exponent vectors are packed into
 * one number (mixed radix with an offset) when every coordinate stays within ±maxAbs
 * and the packed range fits in 2^52; otherwise they are keyed by their text. Packing is
 * linear, key(a + b) = K(a) + K(b) + key(0), so a product's key costs one addition, and
 * numerators below 2^26 (theta leaves: ±1) are multiplied and summed in doubles — exact
 * while every sum stays below 2^52, after which that term goes on in JSBI. A product
 * of theta leaves in eight variables then builds no array and no JSBI per term.
 */
import { JSBI, type Int, isZero } from './integer.js';
import { type Slice, type SparseSlice, forEachTerm } from './slice.js';

/** Numerators below this are multiplied in doubles: a product stays below 2^52. */
const SMALL = 2 ** 26;
/** Sums are kept in doubles below this (exact: two summands below it sum below 2^53). */
const EXACT_SUM = 2 ** 52;

/** A slice's terms ready for accumulation: keys K(e) without offset, numerators as doubles (NaN if large) and as JSBI. */
export interface PackedTerms {
  readonly keys: Float64Array;
  readonly small: Float64Array;
  readonly vals: readonly Int[];
}

export class SparseAccumulator {
  private readonly n: number;
  private readonly radix: number;
  private readonly offset: number;
  /** key(0): the offset of every coordinate, packed. */
  private readonly zeroKey: number;
  /** Packed mode: term slots by key, in first-seen order; each sum in doubles until it is too large, then in JSBI. */
  private readonly slots: Map<number, number> | null;
  private readonly sums: number[] = [];
  private readonly bigs: (Int | null)[] = [];
  private readonly order: number[] = [];
  private readonly keyed: Map<string, { e: readonly number[]; v: Int }> | null;

  constructor(n: number, maxAbs: number) {
    this.n = n;
    this.offset = maxAbs;
    this.radix = 2 * maxAbs + 1;
    const fits = Math.pow(this.radix, n) < 2 ** 52;
    let z = 0;
    for (let i = 0; i < n; i++) z = z * this.radix + maxAbs;
    this.zeroKey = z;
    this.slots = fits ? new Map() : null;
    this.keyed = fits ? null : new Map();
  }

  /** Whether exponent vectors are packed: then addProducts, else add. */
  get packs(): boolean {
    return this.slots !== null;
  }

  /** A slice's terms packed with this accumulator's radix. */
  pack(s: Slice): PackedTerms {
    const keys: number[] = [];
    const small: number[] = [];
    const vals: Int[] = [];
    forEachTerm(s, (e, v) => {
      let k = 0;
      for (let i = 0; i < this.n; i++) k = k * this.radix + e[i]!;
      keys.push(k);
      const x = JSBI.toNumber(v);
      small.push(Math.abs(x) < SMALL ? x : NaN);
      vals.push(v);
    });
    return { keys: Float64Array.from(keys), small: Float64Array.from(small), vals };
  }

  /** Adds every product of a term of a with a term of b (packed mode). */
  addProducts(a: PackedTerms, b: PackedTerms): void {
    const slots = this.slots!;
    const { sums, bigs, order } = this;
    for (let i = 0; i < a.keys.length; i++) {
      const ka = a.keys[i]! + this.zeroKey;
      const sa = a.small[i]!;
      for (let j = 0; j < b.keys.length; j++) {
        const key = ka + b.keys[j]!;
        let slot = slots.get(key);
        if (slot === undefined) {
          slot = sums.length;
          slots.set(key, slot);
          sums.push(0);
          bigs.push(null);
          order.push(key);
        }
        const sb = b.small[j]!;
        const big = bigs[slot]!;
        if (!Number.isNaN(sa) && !Number.isNaN(sb)) {
          const prod = sa * sb;
          if (big !== null) bigs[slot] = JSBI.add(big, JSBI.BigInt(prod));
          else {
            const t = sums[slot]! + prod;
            if (t < EXACT_SUM && t > -EXACT_SUM) sums[slot] = t;
            else bigs[slot] = JSBI.BigInt(t);
          }
        } else {
          const prod = JSBI.multiply(a.vals[i]!, b.vals[j]!);
          bigs[slot] = JSBI.add(big ?? JSBI.BigInt(sums[slot]!), prod);
        }
      }
    }
  }

  /** Adds v·ζ^e (text-keyed mode). */
  add(e: readonly number[], v: Int): void {
    const k = e.join(',');
    const prev = this.keyed!.get(k);
    this.keyed!.set(k, prev === undefined ? { e, v } : { e: prev.e, v: JSBI.add(prev.v, v) });
  }

  /** The exponent vector of a packed key. */
  private unpack(key: number): number[] {
    const e = new Array<number>(this.n);
    let k = key;
    for (let i = this.n - 1; i >= 0; i--) {
      const d = k % this.radix;
      e[i] = d - this.offset;
      k = (k - d) / this.radix;
    }
    return e;
  }

  toSlice(): SparseSlice {
    const exps: (readonly number[])[] = [];
    const vals: Int[] = [];
    if (this.slots !== null) {
      for (let slot = 0; slot < this.order.length; slot++) {
        const big = this.bigs[slot]!;
        const v = big ?? (this.sums[slot] === 0 ? null : JSBI.BigInt(this.sums[slot]!));
        if (v === null || isZero(v)) continue;
        exps.push(this.unpack(this.order[slot]!));
        vals.push(v);
      }
    } else {
      for (const { e, v } of this.keyed!.values()) {
        if (!isZero(v)) {
          exps.push(e);
          vals.push(v);
        }
      }
    }
    return { kind: 'sparse', n: this.n, exps, vals };
  }
}
