// The build math's benchmarks: computeSpec in process, and POST /api/compute over HTTP against its
// floor, the same route refusing an empty body with 422 (the framework's request pipeline, the
// proxy and the JSON reading, with no computation). Used by `npm run bench:compute` and `npm run bench`.
import { computeSpec } from "../../lib/lutherie/compute-spec";
import { presetById } from "../../lib/lutherie/presets";
import { instrumentSpecSchema } from "../../lib/schemas/instrument-spec";
import { met, runGroup, type BenchRow, type LoadPlan, type RunningApp } from "./harness";

/** A fanned 8-string, 27 frets, 3 pickups: the heaviest preset. */
const RAW = presetById("fanned-eight").spec;
export const COMPUTE_BODY = JSON.stringify(RAW);

/** Calls per second of `fn` over `ms`, in batches of 100. */
function rate(fn: () => void, ms: number): number {
  let n = 0;
  const t0 = performance.now();
  while (performance.now() - t0 < ms) {
    for (let i = 0; i < 100; i++) fn();
    n += 100;
  }
  return (n * 1000) / (performance.now() - t0);
}

const median3 = (fn: () => number) => [fn(), fn(), fn()].sort((a, b) => a - b)[1]!;

/** computeSpec calls per second on one core (median of 3 runs of `ms` after a JIT warm-up), without and with the zod parse. */
export function computeInProcess(ms = 2000): { compute: number; parseCompute: number; resultBytes: number } {
  const spec = instrumentSpecSchema.parse(RAW);
  rate(() => computeSpec(spec), 1500);
  const compute = median3(() => rate(() => computeSpec(spec), ms));
  rate(() => computeSpec(instrumentSpecSchema.parse(RAW)), 1000);
  const parseCompute = median3(() => rate(() => computeSpec(instrumentSpecSchema.parse(RAW)), ms));
  return { compute, parseCompute, resultBytes: JSON.stringify(computeSpec(spec)).length };
}

/** POST /api/compute at 10 connections against its floor (the same route answering 422 to `{}`). */
export async function benchCompute(app: RunningApp, plan: LoadPlan, label = ""): Promise<BenchRow[]> {
  const url = `${app.base}/api/compute`;
  const headers = { "content-type": "application/json" };
  return runGroup(
    app,
    {
      connections: 10,
      floor: { name: `POST /api/compute, body {} → 422${label}`, url, method: "POST", headers, body: "{}", expectStatus: 422 },
      targets: [{ name: `POST /api/compute, fanned 8-string${label}`, url, method: "POST", headers, body: COMPUTE_BODY, expectStatus: 200 }],
      goal: (r) => `p95 ≤ 20 ms: ${met(r.p95Ms <= 20)}`,
    },
    plan,
  );
}
