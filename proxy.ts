import { NextResponse, type NextRequest } from "next/server";
import { SESSION_COOKIE } from "@/lib/auth/cookie-name";

// Visitors with no session cookie go straight to sign-in (a real 307, before any page renders) and
// come back afterwards. Pages still check the session and the role themselves.
export function proxy(request: NextRequest) {
  if (request.cookies.has(SESSION_COOKIE)) return NextResponse.next();
  const signIn = new URL("/sign-in", request.url);
  signIn.searchParams.set("next", `${request.nextUrl.pathname}${request.nextUrl.search}`);
  return NextResponse.redirect(signIn);
}

export const config = {
  matcher: ["/rigs/:path*", "/kit/:path*", "/slip-bench/:path*", "/sites/:path*", "/crew/:path*", "/crews/:path*", "/account/:path*"],
};
