import { NextResponse } from "next/server";
import { crewRoute, readJson } from "@/lib/api";
import { offThread } from "@/lib/worker-pool";

// The engine on the server: the same input and the same result shape as `npm run compute`, worked out on a worker
// thread; its sentences in the crew's units, as the browser words them.
export const POST = crewRoute("rig.read", async ({ crew }, request) => {
  const body = await offThread("evaluateRigJson", { input: await readJson(request), units: crew.units });
  return new NextResponse(body, { headers: { "content-type": "application/json" } });
});
