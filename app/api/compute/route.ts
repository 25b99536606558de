import { NextResponse } from "next/server";
import { crewRoute, readJson } from "@/lib/api";
import { evaluateRig } from "@/physics";

// The engine on the server: the same input and the same result shape as `npm run compute`.
export const POST = crewRoute("rig.read", async (_context, request) => NextResponse.json(evaluateRig(await readJson(request))));
