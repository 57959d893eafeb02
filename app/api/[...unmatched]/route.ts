import { NextResponse } from "next/server";

export const dynamic = "force-dynamic";

/**
 * Any /api path that no route handler serves (a mistyped path, /api/verify/a/b): a JSON 404 like every
 * other API answer, instead of the framework's HTML page. It reveals nothing and reads nothing.
 */
function notFound(): NextResponse {
  return NextResponse.json({ error: "not_found", message: "There is no API at this path." }, { status: 404 });
}

export const GET = notFound;
export const POST = notFound;
export const PUT = notFound;
export const PATCH = notFound;
export const DELETE = notFound;
