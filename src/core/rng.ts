/**
 * PCG32 — permuted congruential generator, variant XSH RR 64/32.
 *
 * O'Neill, M. E. (2014). "PCG: A Family of Simple Fast Space-Efficient Statistically Good
 * Algorithms for Random Number Generation", Harvey Mudd College, HMC-CS-2014-0905.
 * https://www.pcg-random.org/paper.html
 *
 * state ← state · 6364136223846793005 + inc   (mod 2⁶⁴), inc odd, chosen by the stream
 * out   ← rotr32(((old ≫ 18) ⊕ old) ≫ 27, old ≫ 59)
 *
 * The 64-bit state is held as two uint32 halves so each draw costs a few integer operations and no
 * allocation (BigInt is used only when seeding). Checked against the authors' published output
 * (pcg-c, test-high/expected/check-pcg32.out) in tests/core/rng.test.ts.
 *
 * Cost: O(1) per draw; uniform doubles take two draws, normals two uniforms (polar method).
 */

const MASK64 = (1n << 64n) - 1n;
const MUL_HI = 0x5851f42d;
const MUL_LO = 0x4c957f2d;

export class Pcg32 {
  // State in typed arrays: uint32 halves above 2^31 and doubles then live unboxed, so a draw never
  // allocates (object fields holding such numbers may be boxed by the engine).
  /** [state hi, state lo, increment hi, increment lo] */
  private readonly s = new Uint32Array(4);
  private readonly spare = new Float64Array(1);
  private hasSpare = false;

  /** `pcg32_srandom_r(initstate, initseq)` of the reference implementation. */
  constructor(initState: bigint, initSeq: bigint) {
    const inc = ((initSeq << 1n) | 1n) & MASK64;
    const st = this.s;
    st[2] = Number(inc >> 32n);
    st[3] = Number(inc & 0xffffffffn);
    this.advance();
    const s = ((BigInt(st[0]) << 32n) | BigInt(st[1])) + (initState & MASK64);
    st[0] = Number((s >> 32n) & 0xffffffffn);
    st[1] = Number(s & 0xffffffffn);
    this.advance();
  }

  /** state ← state·MUL + inc (mod 2⁶⁴), on 32-bit halves with 16-bit limbs for the low product. */
  private advance(): void {
    const st = this.s;
    const hi = st[0];
    const lo = st[1];
    const a0 = lo & 0xffff;
    const a1 = lo >>> 16;
    const b0 = MUL_LO & 0xffff;
    const b1 = MUL_LO >>> 16;
    const p00 = a0 * b0;
    const p01 = a0 * b1;
    const p10 = a1 * b0;
    const p11 = a1 * b1;
    const mid = (p00 >>> 16) + (p01 & 0xffff) + (p10 & 0xffff);
    const prodLo = (((mid & 0xffff) << 16) | (p00 & 0xffff)) >>> 0;
    const prodHi = p11 + (p01 >>> 16) + (p10 >>> 16) + (mid >>> 16);
    const newHi = prodHi + Math.imul(hi, MUL_LO) + Math.imul(lo, MUL_HI);
    const sumLo = prodLo + st[3];
    st[1] = sumLo >>> 0;
    st[0] = (newHi + st[2] + (sumLo > 0xffffffff ? 1 : 0)) >>> 0;
  }

  /** Next uniformly distributed uint32 (`pcg32_random_r`). */
  nextU32(): number {
    const hi = this.s[0];
    const lo = this.s[1];
    this.advance();
    const xhi = hi ^ (hi >>> 18);
    const xlo = lo ^ ((lo >>> 18) | (hi << 14));
    const xs = ((xlo >>> 27) | (xhi << 5)) >>> 0;
    const rot = hi >>> 27;
    return ((xs >>> rot) | (xs << (-rot & 31))) >>> 0;
  }

  /** Uniform integer in [0, bound) without modulo bias (`pcg32_boundedrand_r`). */
  nextBelow(bound: number): number {
    if (!Number.isInteger(bound) || bound < 1 || bound > 0xffffffff) {
      throw new RangeError(`nextBelow: bound must be an integer in [1, 2^32), got ${bound}`);
    }
    const threshold = (0x100000000 - bound) % bound;
    for (;;) {
      const r = this.nextU32();
      if (r >= threshold) return r % bound;
    }
  }

  /** Uniform double in [0, 1) with 53 random bits (two draws). */
  nextFloat(): number {
    const a = this.nextU32() >>> 5;
    const b = this.nextU32() >>> 6;
    return (a * 67108864 + b) / 9007199254740992;
  }

  /**
   * Standard normal N(0, 1) by the Marsaglia–Bray polar method (Marsaglia & Bray 1964, "A convenient
   * method for generating normal variables", SIAM Review 6(3):260–264). Pairs are cached.
   */
  nextNormal(): number {
    if (this.hasSpare) {
      this.hasSpare = false;
      return this.spare[0];
    }
    let u = 0;
    let v = 0;
    let s = 0;
    do {
      u = 2 * this.nextFloat() - 1;
      v = 2 * this.nextFloat() - 1;
      s = u * u + v * v;
    } while (s >= 1 || s === 0);
    const m = Math.sqrt((-2 * Math.log(s)) / s);
    this.spare[0] = v * m;
    this.hasSpare = true;
    return u * m;
  }

  /** Fills `out` with independent N(0, scale²) draws. */
  fillNormal(out: Float64Array, scale = 1): void {
    for (let i = 0; i < out.length; i++) out[i] = scale * this.nextNormal();
  }
}

/**
 * FNV-1a, 64-bit, over the UTF-8 bytes of `text` (Fowler, Noll, Vo; IETF draft
 * draft-eastlake-fnv). Used only to turn a run's identity into seed material, once per run.
 */
export function fnv1a64(text: string): bigint {
  let h = 0xcbf29ce484222325n;
  for (const byte of new TextEncoder().encode(text)) {
    h ^= BigInt(byte);
    h = (h * 0x100000001b3n) & MASK64;
  }
  return h;
}

/**
 * SplitMix64 output function (Steele, Lea & Flood 2014, "Fast splittable pseudorandom number
 * generators", OOPSLA), used to mix seed material before it seeds a PCG32 stream.
 */
export function splitmix64(x: bigint): bigint {
  let z = (x + 0x9e3779b97f4a7c15n) & MASK64;
  z = ((z ^ (z >> 30n)) * 0xbf58476d1ce4e5b9n) & MASK64;
  z = ((z ^ (z >> 27n)) * 0x94d049bb133111ebn) & MASK64;
  return z ^ (z >> 31n);
}

/**
 * The seed of one run: a function of the suite seed, the problem instance and the seed index only,
 * so adding, removing or reordering cases never changes another run's numbers, and every optimizer
 * sees the same start points and noise for the same seed index (paired comparisons).
 */
export function deriveRunSeed(suiteSeed: number, problemKey: string, seedIndex: number): bigint {
  const base = splitmix64(BigInt(suiteSeed) & MASK64);
  return splitmix64(base ^ fnv1a64(`${problemKey}#${seedIndex}`));
}

/** Named streams of one run, so drawing more noise never shifts the start point. */
export const STREAM = {
  start: 1n,
  noise: 2n,
  structure: 3n,
} as const;

export function runStream(runSeed: bigint, stream: bigint): Pcg32 {
  return new Pcg32(runSeed, stream);
}

/** Seed of a problem's fixed structure (rotation, data set): depends on the problem alone. */
export function structureRng(problemKey: string, structureSeed: number): Pcg32 {
  return new Pcg32(splitmix64(fnv1a64(problemKey) ^ BigInt(structureSeed)), STREAM.structure);
}

export function seedToHex(seed: bigint): string {
  return seed.toString(16).padStart(16, "0");
}
