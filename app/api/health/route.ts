import { NextResponse } from "next/server";
import { databaseHealth } from "@/db/health";
import { APP_VERSION } from "@/lib/version";

export const dynamic = "force-dynamic";

// Liveness for load balancers and for the start script: 200 only when the database answers.
export async function GET() {
  const database = await databaseHealth();
  return NextResponse.json({ status: database.reachable ? "ok" : "unavailable", version: APP_VERSION, database }, { status: database.reachable ? 200 : 503 });
}
