import { NextResponse } from "next/server";
import { crewRoute, parseBody } from "@/lib/api";
import { AccessError, type CrewContext } from "@/lib/authz";
import { RequestError } from "@/lib/http-errors";
import { can, refusalText } from "@/lib/roles";
import { ChangeRoleSchema } from "@/lib/validations/crew";
import { changeMembership, type MembershipChange } from "@/db/crews";

type Params = { userId: string };

function answer(outcome: MembershipChange, done: object): NextResponse {
  if (outcome === "not_found") throw new RequestError(404, "That person is no longer in this crew.");
  if (outcome === "last_owner") throw new RequestError(409, "The crew must keep at least one owner: make someone else an owner first.");
  return NextResponse.json(done);
}

export const PATCH = crewRoute<Params>("crew.roles", async ({ crew }, request, { userId }) => {
  const { role } = await parseBody(request, ChangeRoleSchema);
  return answer(await changeMembership(crew.id, userId, { role }), { userId, role });
});

// Owners remove anyone; everyone may leave a crew themselves (unless they are its last owner).
export const DELETE = crewRoute<Params>("crew.read", async (context: CrewContext, _request, { userId }) => {
  if (userId !== context.user.id && !can(context.role, "crew.roles")) {
    throw new AccessError(403, refusalText("crew.roles", context.role, context.crew.name));
  }
  return answer(await changeMembership(context.crew.id, userId, "remove"), { removed: userId });
});
