import { NextResponse } from "next/server";
import { crewRoute } from "@/lib/api";
import { buildSlipTable, slipTableCsv } from "@/lib/slip-table";
import { listSlipTests } from "@/db/slip-tests";

/** The crew's slip table as JSON, or as a CSV file with ?format=csv. */
export const GET = crewRoute("slip.read", async ({ crew }, request) => {
  const table = buildSlipTable(await listSlipTests(crew.id));
  if (request.nextUrl.searchParams.get("format") !== "csv") return NextResponse.json({ table });
  return new Response(slipTableCsv(table, crew.units), {
    headers: { "content-type": "text/csv; charset=utf-8", "content-disposition": 'attachment; filename="slip-table.csv"' },
  });
});
