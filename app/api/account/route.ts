import { NextResponse } from "next/server";
import { parseBody, signedInRoute } from "@/lib/api";
import { RequestError } from "@/lib/http-errors";
import { ProfileSchema } from "@/lib/validations/account";
import { updateProfile } from "@/db/users";

export const PATCH = signedInRoute(async ({ user }, request) => {
  const profile = await parseBody(request, ProfileSchema);
  if (!(await updateProfile(user.id, profile))) {
    throw new RequestError(409, "Another account already uses that e-mail.", { email: "Another account already uses this e-mail." });
  }
  return NextResponse.json({ user: profile });
});
