import { NextResponse } from "next/server";
import { parseBody, signedInRoute } from "@/lib/api";
import { chooseCrew } from "@/lib/authz";
import { CreateCrewSchema } from "@/lib/validations/crew";
import { createCrew } from "@/db/crews";

export const GET = signedInRoute(async ({ user }) => NextResponse.json({ crews: user.memberships }));

// Whoever creates a crew is its first owner, and works in it from now on.
export const POST = signedInRoute(async ({ user }, request) => {
  const { name } = await parseBody(request, CreateCrewSchema);
  const crew = await createCrew(name, user.id);
  await chooseCrew(crew.id);
  return NextResponse.json({ crew }, { status: 201 });
});
