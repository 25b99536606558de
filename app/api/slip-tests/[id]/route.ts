import { NextResponse } from "next/server";
import { crewRoute } from "@/lib/api";
import { RequestError } from "@/lib/http-errors";
import { rowId } from "@/lib/validations/ids";
import { findSlipTest } from "@/db/slip-tests";
import { traceAnalysis } from "@/db/uploads";

export const GET = crewRoute<{ id: string }>("slip.read", async ({ crew }, _request, { id }) => {
  const test = await findSlipTest(crew.id, rowId(id, "slip test"));
  if (!test) throw new RequestError(404, "No such slip test in this crew.");
  const analysis = test.traceUploadId ? await traceAnalysis(crew.id, test.traceUploadId) : null;
  return NextResponse.json({ test, analysis });
});
