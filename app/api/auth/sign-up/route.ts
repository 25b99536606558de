import { NextResponse } from "next/server";
import { parseBody, route } from "@/lib/api";
import { RequestError } from "@/lib/http-errors";
import { SignUpSchema } from "@/lib/validations/account";
import { createUser } from "@/db/users";
import { hashPassword } from "@/lib/auth/passwords";
import { startSession } from "@/lib/auth/session";

export const POST = route(async (request) => {
  const input = await parseBody(request, SignUpSchema);
  const user = await createUser({ email: input.email, name: input.name, passwordHash: await hashPassword(input.password) });
  if (!user)
    throw new RequestError(409, "An account with that e-mail already exists: sign in, or reset its password.", {
      email: "This e-mail already has an account.",
    });
  await startSession(user.id, request.headers.get("user-agent"));
  return NextResponse.json({ user: { name: user.name, email: user.email } }, { status: 201 });
});
