import { NextResponse } from "next/server";
import { crewRoute } from "@/lib/api";
import { appOrigin } from "@/lib/app-origin";
import { newToken } from "@/lib/tokens";
import { publishSlipTable, revokeSlipTable } from "@/db/slip-tests";

/** Publishes a read-only link to the slip table (any earlier link stops working). The token is shown only now. */
export const POST = crewRoute("slip.publish", async ({ crew, user }, request) => {
  const { token, tokenHash } = newToken();
  await publishSlipTable(crew.id, user.id, tokenHash);
  return NextResponse.json({ token, url: new URL(`/shared/slip-table/${token}`, appOrigin(request)).toString() }, { status: 201 });
});

export const DELETE = crewRoute("slip.publish", async ({ crew }) => {
  return NextResponse.json({ revoked: await revokeSlipTable(crew.id) });
});
