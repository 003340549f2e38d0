// A small seeded PRNG so the demo corpus is the same on every machine and every run: the loader's
// idempotency rests on identical bytes, hence identical SHA-256, for the same seed.

/** mulberry32: 32-bit state, good enough for picking words; not for anything statistical. */
export function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export class Rng {
  private next: () => number;
  constructor(seed: number) {
    this.next = mulberry32(seed);
  }
  float(): number {
    return this.next();
  }
  chance(p: number): boolean {
    return this.next() < p;
  }
  /** Integer in [lo, hi], both ends included. */
  int(lo: number, hi: number): number {
    return lo + Math.floor(this.next() * (hi - lo + 1));
  }
  pick<T>(xs: readonly T[]): T {
    if (xs.length === 0) throw new Error("pick from an empty list");
    return xs[Math.floor(this.next() * xs.length)];
  }
  weighted<T>(entries: readonly (readonly [T, number])[]): T {
    const total = entries.reduce((s, [, w]) => s + Math.max(0, w), 0);
    if (total <= 0) throw new Error("weighted pick with no positive weight");
    let u = this.next() * total;
    for (const [x, w] of entries) {
      u -= Math.max(0, w);
      if (u < 0) return x;
    }
    return entries[entries.length - 1][0];
  }
  /** `n` distinct items (fewer if the list is shorter), in random order. */
  sample<T>(xs: readonly T[], n: number): T[] {
    const copy = xs.slice();
    for (let i = copy.length - 1; i > 0; i--) {
      const j = Math.floor(this.next() * (i + 1));
      [copy[i], copy[j]] = [copy[j], copy[i]];
    }
    return copy.slice(0, Math.min(n, copy.length));
  }
}
