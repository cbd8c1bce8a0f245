/**
 * A seeded stream of uniform numbers in [0, 1): xoshiro128** (Blackman & Vigna, 2018) with its
 * state filled by splitmix32, so any 32-bit seed, including 0, gives a well-mixed start.
 * 32-bit arithmetic only, so results are identical on every JavaScript engine.
 */
export function createRandomStream(seed: number): () => number {
  let mix = seed >>> 0;
  const splitmix32 = (): number => {
    mix = (mix + 0x9e3779b9) | 0;
    let z = mix;
    z = Math.imul(z ^ (z >>> 16), 0x85ebca6b);
    z = Math.imul(z ^ (z >>> 13), 0xc2b2ae35);
    return (z ^ (z >>> 16)) >>> 0;
  };
  let a = splitmix32();
  let b = splitmix32();
  let c = splitmix32();
  let d = splitmix32();
  return () => {
    const result = Math.imul(rotateLeft(Math.imul(b, 5), 7), 9);
    const t = b << 9;
    c ^= a;
    d ^= b;
    b ^= c;
    a ^= d;
    c ^= t;
    d = rotateLeft(d, 11);
    return (result >>> 0) / 4294967296;
  };
}

function rotateLeft(value: number, bits: number): number {
  return (value << bits) | (value >>> (32 - bits));
}
