import NextAuth from "next-auth";
import { NextResponse } from "next/server";
import { authOptions } from "@/lib/auth/options";
import { clientAddress, isSignInThrottled, recordSignInFailure } from "@/lib/auth/throttle";

interface AuthContext {
  params: Promise<{ nextauth: string[] }>;
}

function nextAuth(request: Request, context: AuthContext): Promise<Response> {
  return NextAuth(request as never, context as never, authOptions()) as Promise<Response>;
}

export function GET(request: Request, context: AuthContext): Promise<Response> {
  return nextAuth(request, context);
}

/**
 * Password sign-in is throttled here, at the edge of next-auth: an account or address with 10 failures
 * in 15 minutes gets 429 before its password is even checked. The answer never says whether the account exists.
 */
export async function POST(request: Request, context: AuthContext): Promise<Response> {
  const { nextauth } = await context.params;
  const isPasswordSignIn = nextauth[0] === "callback" && nextauth[1] === "password";
  if (!isPasswordSignIn) return nextAuth(request, context);

  const form = await request.clone().formData().catch(() => null);
  const email = String(form?.get("email") ?? "").slice(0, 254);
  const address = clientAddress(request.headers);
  if (await isSignInThrottled(email, address)) {
    const url = new URL("/sign-in?error=throttled", request.url).toString();
    return NextResponse.json({ url, error: "too_many_requests" }, { status: 429, headers: { "Retry-After": "900" } });
  }
  const response = await nextAuth(request, context);
  const location = response.headers.get("location") ?? "";
  if (response.status === 401 || location.includes("error=")) {
    await recordSignInFailure(email, address);
  }
  return response;
}
