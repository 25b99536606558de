import { NextResponse } from "next/server";
import { signedInRoute } from "@/lib/api";
import { RequestError } from "@/lib/http-errors";
import { deleteSessionOf } from "@/db/users";

export const DELETE = signedInRoute<{ id: string }>(async ({ user }, _request, { id }) => {
  if (!(await deleteSessionOf(user.id, id))) throw new RequestError(404, "That device is already signed out.");
  return NextResponse.json({ signedOut: id });
});
