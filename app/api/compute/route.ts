import { NextResponse } from "next/server";
import { crewRoute, readJson } from "@/lib/api";
import { offThread } from "@/lib/worker-pool";

// The engine on the server: the same input and the same result shape as `npm run compute`, worked out on a worker thread.
export const POST = crewRoute("rig.read", async (_context, request) => NextResponse.json(await offThread("evaluateRig", await readJson(request))));
