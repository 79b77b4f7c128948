/**
 * A small seeded PRNG for repeatable fault schedules and jitter: mulberry32 (Tommy Ettinger's
 * 32-bit generator, public domain; from memory). Not for anything but tests.
 * @example const r = seededRandom(42); r() // a number in [0, 1), the same on every run
 */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
