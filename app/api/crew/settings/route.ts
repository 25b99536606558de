import { NextResponse } from "next/server";
import { crewRoute, parseBody } from "@/lib/api";
import { CrewSettingsSchema } from "@/lib/validations/crew";
import { crewSettings, updateCrewSettings } from "@/db/crews";

export const GET = crewRoute("crew.read", async ({ crew }) => NextResponse.json({ settings: await crewSettings(crew.id) }));

export const PATCH = crewRoute("crew.settings", async ({ crew }, request) => {
  const settings = await parseBody(request, CrewSettingsSchema);
  await updateCrewSettings(crew.id, settings);
  return NextResponse.json({ settings });
});
