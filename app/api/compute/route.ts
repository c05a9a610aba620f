// POST /api/compute – the build math for an instrument spec; public, no sign-in, rate-limited per IP.
import { NextResponse } from "next/server";
import { AppError } from "@/lib/http/errors";
import { enforceClientLimit, rateLimitHeaders, RateLimitedError } from "@/lib/http/rate-limit";
import { errorResponse, readJson } from "@/lib/http/respond";
import { computeSpec } from "@/lib/lutherie/compute-spec";
import { instrumentSpecSchema } from "@/lib/schemas/instrument-spec";

export const dynamic = "force-dynamic";

/** A spec is a few kilobytes; anything far larger is refused before it is parsed. */
const MAX_BODY_BYTES = 64 * 1024;

function computeLimit() {
  return {
    name: "compute",
    limit: Number(process.env.COMPUTE_RATE_LIMIT ?? 60),
    windowSeconds: Math.max(1, Number(process.env.COMPUTE_RATE_WINDOW_SECONDS ?? 60)),
  };
}

// 200 with the result (warnings in `issues`); 400 unreadable body; 422 schema errors, or a spec the
// computation finds impossible or dangerous (error-level issues, all issues listed); 429 over the limit.
export async function POST(req: Request) {
  let headers: Record<string, string> = {};
  try {
    const decision = await enforceClientLimit(req, computeLimit());
    if (decision) headers = rateLimitHeaders(decision);
    if (Number(req.headers.get("content-length") ?? 0) > MAX_BODY_BYTES) {
      throw new AppError("bad_request", `The request body is larger than ${MAX_BODY_BYTES / 1024} KB.`);
    }
    const spec = await readJson(req, instrumentSpecSchema);
    const result = computeSpec(spec);
    const errors = result.issues.filter((i) => i.level === "error").length;
    if (errors > 0) {
      throw new AppError("validation_failed", `The spec is impossible or unsafe: ${errors} error${errors > 1 ? "s" : ""}, see issues.`, result.issues);
    }
    return NextResponse.json(result, { headers });
  } catch (err) {
    if (err instanceof RateLimitedError) headers = rateLimitHeaders(err.decision);
    const res = errorResponse(err);
    for (const [k, v] of Object.entries(headers)) res.headers.set(k, v);
    return res;
  }
}
