import { NextResponse } from "next/server";
import { route } from "@/lib/http/route";
import { NotFoundError } from "@/lib/http/errors";
import { verifyCode } from "@/lib/data/certificates";
import { openBadgeCredential } from "@/lib/certificates/open-badge";
import { publicBaseUrl } from "@/lib/env";

export const dynamic = "force-dynamic";

interface Context {
  params: Promise<{ code: string }>;
}

/**
 * Public: the certificate as an Open Badges 3.0 credential (JSON-LD, unsigned: no proof; the live
 * status is this address and the verification page). Unknown codes get a plain 404.
 */
export const GET = route<Context>(async (_request, { params }) => {
  const { code } = await params;
  const verification = await verifyCode(code);
  if (!verification) throw new NotFoundError();
  return NextResponse.json(openBadgeCredential(verification, publicBaseUrl()), {
    headers: { "Content-Type": "application/ld+json; charset=utf-8", "Cache-Control": "no-store" },
  });
});
