/**
 * A small seeded generator of numbers in [0, 1) (mulberry32), so generated data — the demo, the
 * bulk fixtures — is the same on every machine. A text seed is hashed to a number first.
 */
export function seededRandom(seed: number | string): () => number {
  let a = 0;
  if (typeof seed === "number") a = seed >>> 0;
  else for (const ch of seed) a = (Math.imul(a ^ ch.charCodeAt(0), 2654435761) + 1) >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
