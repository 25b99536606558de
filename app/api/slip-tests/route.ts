import { NextResponse } from "next/server";
import { crewRoute, parseBody } from "@/lib/api";
import { RequestError } from "@/lib/http-errors";
import { rowId } from "@/lib/validations/ids";
import { SlipTestSchema } from "@/lib/validations/slip-tests";
import { SLIP_DEVICE_KINDS } from "@/lib/validations/kit";
import type { TraceAnalysis } from "@/lib/trace-analysis";
import { isCorrection } from "@/lib/slip-table";
import { findModel } from "@/db/kit";
import { insertSlipTest, listSlipTests } from "@/db/slip-tests";
import { traceAnalysis } from "@/db/uploads";
import { toNewtons } from "@/physics";

export const GET = crewRoute("slip.read", async ({ crew }, request) => {
  const params = request.nextUrl.searchParams;
  const deviceId = params.get("deviceId");
  const diameter = params.get("ropeDiameterMm");
  if (diameter !== null && !Number.isFinite(Number(diameter))) throw new RequestError(400, `ropeDiameterMm "${diameter}" is not a number of millimetres.`);
  const tests = await listSlipTests(crew.id, {
    deviceId: deviceId ? rowId(deviceId, "device") : undefined,
    ropeDiameterMm: diameter === null ? undefined : Number(diameter),
  });
  return NextResponse.json({ tests });
});

const fieldError = (field: string, message: string) => new RequestError(400, message, { [field]: message });

export const POST = crewRoute("slip.write", async ({ crew, user }, request) => {
  const test = await parseBody(request, SlipTestSchema);
  const device = await findModel(crew.id, test.deviceModelId);
  if (!device || !(SLIP_DEVICE_KINDS as readonly string[]).includes(device.kind)) {
    throw fieldError("deviceModelId", "Choose a brake or line grip of this crew's Kit as the device tested.");
  }
  if (test.ropeModelId) {
    const rope = await findModel(crew.id, test.ropeModelId);
    if (!rope || rope.kind !== "rope") throw fieldError("ropeModelId", "Choose a rope of this crew's Kit, or none.");
  }
  const analysis = test.traceUploadId ? await traceAnalysis<TraceAnalysis>(crew.id, test.traceUploadId) : null;
  if (test.traceUploadId && !analysis) throw fieldError("traceUploadId", "That trace is not in this crew: upload it again.");
  const forceN = toNewtons(test.force, test.forceUnit);
  // A value that differs from what the engine found in the trace is kept, with the tester's reason.
  if (isCorrection(analysis?.onset ?? null, test.result, forceN) && test.notes.trim() === "") {
    throw fieldError("notes", "You changed the value detected in the trace: say in the notes why, so the crew can see it was a correction.");
  }
  const saved = await insertSlipTest(crew.id, {
    ...test,
    forceN,
    testedBy: user.id,
    detected: analysis ? { onset: analysis.onset, engineVersion: analysis.engineVersion } : null,
  });
  return NextResponse.json({ test: saved }, { status: 201 });
});
