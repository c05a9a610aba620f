// Harmonic content seen by a point pickup (SOURCES §2.9).
//   w_n = |sin(n π x / L)|, x measured from the bridge   [textbook] Fletcher & Rossing ch. 2, normal modes
// Nodes fall at x/L = k/n. These are the raw mode-shape weights only: the pluck position, the
// pickup's aperture, its coil and the load circuit are not applied (see SOURCES §2.9).

import { HARMONIC_COUNT, NEAR_NULL_WEIGHT } from "./practice";

export interface HarmonicWeight {
  n: number;
  weight: number;
}

/**
 * |sin(nπx/L)| for n = 1…count at distance x from the bridge on a vibrating length L (same unit),
 * as a plain list: index k holds harmonic n = k + 1.
 */
export function harmonicWeightList(fromBridge: number, vibratingLength: number, count = HARMONIC_COUNT): number[] {
  const out = new Array<number>(count);
  const phase = (Math.PI * fromBridge) / vibratingLength;
  // sin((n+1)φ) = 2cosφ·sin(nφ) − sin((n−1)φ): one sin and one cos instead of `count` sines;
  // the rounding error grows only linearly, ~n·1e-16 at n = 16.
  const twoCos = 2 * Math.cos(phase);
  let prev = 0;
  let cur = Math.sin(phase);
  for (let k = 0; k < count; k++) {
    out[k] = Math.abs(cur);
    const next = twoCos * cur - prev;
    prev = cur;
    cur = next;
  }
  return out;
}

/** The same weights as `{n, weight}` rows. */
export function harmonicWeights(fromBridge: number, vibratingLength: number, count = HARMONIC_COUNT): HarmonicWeight[] {
  return harmonicWeightList(fromBridge, vibratingLength, count).map((weight, k) => ({ n: k + 1, weight }));
}

/** The harmonics (n) whose weight is below the threshold: the ones this position nearly cancels. */
export function nearlyCancelled(weights: readonly number[], threshold = NEAR_NULL_WEIGHT): number[] {
  const out: number[] = [];
  for (let k = 0; k < weights.length; k++) if (weights[k]! < threshold) out.push(k + 1);
  return out;
}
