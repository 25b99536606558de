import { NextResponse } from "next/server";
import { crewRoute } from "@/lib/api";
import { membersOf } from "@/db/crews";

export const GET = crewRoute("crew.read", async ({ crew }) => NextResponse.json({ members: await membersOf(crew.id) }));
