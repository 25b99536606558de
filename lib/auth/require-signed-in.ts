import { redirect } from "next/navigation";
import { getCurrentSession, type SignedIn } from "./session";

/** For pages that need a signed-in person but no crew: sign-in first, then back here. */
export async function requireSignedIn(returnTo: string): Promise<SignedIn> {
  const signedIn = await getCurrentSession();
  if (!signedIn) redirect(`/sign-in?next=${encodeURIComponent(returnTo)}`);
  return signedIn;
}
