/**
 * Seeded uniform numbers for the noise workload and recorder: mulberry32, the same generator as
 * test/model/random.ts (repeated here because these plain Node scripts run without a build step
 * and cannot import TypeScript).
 */
export function seededUniform(seed) {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** A seeded Fisher-Yates shuffle of a copy. */
export function shuffled(items, uniform) {
  const out = [...items];
  for (let i = out.length - 1; i > 0; i--) {
    const j = Math.floor(uniform() * (i + 1));
    [out[i], out[j]] = [out[j], out[i]];
  }
  return out;
}
