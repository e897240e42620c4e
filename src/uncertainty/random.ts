/**
 * A small seeded generator so a Monte Carlo run is reproducible from the seed recorded in
 * results.json. mulberry32 (Tommy Ettinger, public domain): 32-bit state, period 2³², fast and
 * plenty for a few ten thousand draws; not for cryptography.
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

/**
 * Standard normal draws by the Box–Muller transform (Box & Muller, Ann. Math. Statist. 29, 1958;
 * from memory, confident). Each call returns one draw; the pair's second half is kept for the next.
 */
export function normalSource(uniform: () => number): () => number {
  let spare: number | undefined;
  return () => {
    if (spare !== undefined) {
      const s = spare;
      spare = undefined;
      return s;
    }
    let u = 0;
    while (u === 0) u = uniform();
    const v = uniform();
    const r = Math.sqrt(-2 * Math.log(u));
    spare = r * Math.sin(2 * Math.PI * v);
    return r * Math.cos(2 * Math.PI * v);
  };
}
