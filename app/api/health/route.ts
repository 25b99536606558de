import { NextResponse } from "next/server";
import { databaseHealth } from "@/db/health";
import { databaseUnavailable } from "@/lib/api";
import { APP_VERSION } from "@/lib/version";

export const dynamic = "force-dynamic";

// Liveness for load balancers and for the start script: 200 only when the database answers.
export async function GET() {
  const database = await databaseHealth();
  if (!database.reachable) return databaseUnavailable();
  return NextResponse.json({ status: "ok", version: APP_VERSION, database });
}
