import { NextResponse } from "next/server";
import { crewRoute } from "@/lib/api";
import { readJsonBytes } from "@/lib/request-body";
import { offThread } from "@/lib/worker-pool";

// The engine on the server: the same input and the same result shape as `npm run compute`, parsed and worked out on
// a worker thread; its sentences in the crew's units, as the browser words them.
export const POST = crewRoute("rig.read", async ({ crew }, request) => {
  const body = await readJsonBytes(request);
  const answer = await offThread("evaluateRigJson", { body, units: crew.units }, [body.buffer]);
  return new NextResponse(answer, { headers: { "content-type": "application/json" } });
});
