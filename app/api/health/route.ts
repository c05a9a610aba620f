// GET /api/health – liveness for the launcher and load balancers; 503 while the database is away.
import { NextResponse } from "next/server";
import { isDatabaseUp } from "@/lib/data/health";

export const dynamic = "force-dynamic";

export async function GET() {
  const dbUp = await isDatabaseUp();
  return NextResponse.json({ ok: dbUp, database: dbUp ? "up" : "down" }, { status: dbUp ? 200 : 503 });
}
