import NextAuth from "next-auth";
import { NextRequest, NextResponse } from "next/server";
import { authOptions } from "@/lib/auth/options";
import { clientAddress, isSignInThrottled, recordSignInFailure } from "@/lib/auth/throttle";
import { NotFoundError } from "@/lib/http/errors";
import { errorResponse, readForm } from "@/lib/http/route";
import { authGetActions, authPostForms, isAuthPostAction, maxAuthFormBytes } from "@/lib/validations/auth-forms";

interface AuthContext {
  params: Promise<{ nextauth: string[] }>;
}

function nextAuth(request: Request, context: AuthContext): Promise<Response> {
  return NextAuth(request as never, context as never, authOptions()) as Promise<Response>;
}

/** Only the GET actions in authGetActions reach next-auth; anything else is a JSON 404 naming the path. */
export async function GET(request: Request, context: AuthContext): Promise<Response> {
  const action = ((await context.params).nextauth ?? []).join("/");
  if (!authGetActions.has(action)) return errorResponse(notServed(action, "GET"));
  return nextAuth(request, context);
}

function notServed(action: string, method: string): NotFoundError {
  return new NotFoundError(`path: /api/auth/${action.slice(0, 100)} takes no ${method} here.`, { path: ["no such sign-in action"] });
}

/**
 * Every POST is checked before next-auth reads it: only the actions Slipway uses (password and link
 * sign-in, sign-out) are served, each with a strict form of at most 32 KB (400 naming a bad field, 413,
 * 415 for another content type, 404 for any other action), so malformed input never reaches next-auth,
 * which answered a malformed JSON body with a 500. Refusals carry the `url` next-auth's client expects.
 *
 * Password sign-in is throttled here too: an account or address with 10 failures in 15 minutes gets 429
 * before its password is even checked. The answer never says whether the account exists.
 */
export async function POST(request: Request, context: AuthContext): Promise<Response> {
  const { nextauth } = await context.params;
  const action = (nextauth ?? []).join("/");
  const refused = (error: unknown) => errorResponse(error, { url: new URL("/sign-in?error=invalid", request.url).toString() });
  if (!isAuthPostAction(action)) return refused(notServed(action, "POST"));
  let checked: { fields: Record<string, string | undefined>; text: string };
  try {
    checked = await readForm<Record<string, string | undefined>>(request, authPostForms[action], maxAuthFormBytes);
  } catch (error) {
    return refused(error);
  }
  // next-auth reads the body itself: hand it the checked text, unchanged.
  const forwarded = new NextRequest(request.url, { method: "POST", headers: request.headers, body: checked.text });
  if (action !== "callback/password") return nextAuth(forwarded, context);

  const email = checked.fields.email ?? "";
  const address = clientAddress(request.headers);
  if (await isSignInThrottled(email, address)) {
    const url = new URL("/sign-in?error=throttled", request.url).toString();
    return NextResponse.json({ url, error: "too_many_requests" }, { status: 429, headers: { "Retry-After": "900" } });
  }
  const response = await nextAuth(forwarded, context);
  const location = response.headers.get("location") ?? "";
  if (response.status === 401 || location.includes("error=")) {
    await recordSignInFailure(email, address);
  }
  return response;
}
