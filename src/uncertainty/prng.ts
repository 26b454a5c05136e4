/**
 * Seeded pseudo-random numbers for the Monte Carlo check: Mulberry32 (a 32-bit generator, public-domain
 * algorithm by Tommy Ettinger) for uniforms and the Box–Muller transform for standard normal deviates
 * (Box & Muller, Ann. Math. Statist. 29, 610, 1958). Deterministic for a seed, on every platform.
 */
export function createNormalSampler(seed: number): () => number {
  let a = seed >>> 0;
  const uniform = () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  let spare: number | undefined;
  return () => {
    if (spare !== undefined) {
      const z = spare;
      spare = undefined;
      return z;
    }
    let u1 = uniform();
    while (u1 === 0) u1 = uniform();
    const u2 = uniform();
    const r = Math.sqrt(-2 * Math.log(u1));
    spare = r * Math.sin(2 * Math.PI * u2);
    return r * Math.cos(2 * Math.PI * u2);
  };
}
