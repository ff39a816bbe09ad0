// Only redirects signed-out visitors to the sign-in page. Every decision about what a
// signed-in person may do is made by src/server/policy.ts, not here.
import { getToken } from "next-auth/jwt";
import { NextResponse, type NextRequest } from "next/server";

export async function proxy(request: NextRequest) {
  const token = await getToken({ req: request, secret: process.env.NEXTAUTH_SECRET });
  if (token) return NextResponse.next();
  const signIn = new URL("/sign-in", request.url);
  const wanted = request.nextUrl.pathname + request.nextUrl.search;
  if (wanted !== "/") signIn.searchParams.set("callbackUrl", wanted);
  return NextResponse.redirect(signIn);
}

export const config = {
  // Pages only: API routes answer 401 themselves; public pages and assets pass.
  matcher: ["/((?!api|_next|sign-in|join|invite|reset-password|unsubscribe|icon.svg|guyline-mark.svg|favicon.ico).*)"],
};
