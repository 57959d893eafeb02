import { NextResponse } from "next/server";
import { z } from "zod";
import { readParams, route } from "@/lib/http/route";
import { NotFoundError } from "@/lib/http/errors";
import { verifyCode } from "@/lib/data/certificates";
import { openBadgeCredential } from "@/lib/certificates/open-badge";
import { looksLikeVerificationCode } from "@/lib/certificates/verification-code";
import { publicBaseUrl } from "@/lib/env";

export const dynamic = "force-dynamic";

interface Context {
  params: Promise<{ code: string }>;
}

const verifyParamSchema = z.strictObject({
  code: z.string().refine(looksLikeVerificationCode, { error: "not a verification code (24 letters, digits, - or _)" }),
});

/**
 * Public: the certificate as an Open Badges 3.0 credential (JSON-LD, unsigned: no proof; the live
 * status is this address and the verification page). A malformed code is 400, an unknown one 404.
 * The query string is ignored (shared links often carry tracking parameters).
 */
export const GET = route<Context>(async (_request, { params }) => {
  const { code } = await readParams(params, verifyParamSchema);
  const verification = await verifyCode(code);
  if (!verification) throw new NotFoundError("code: no certificate has this code.", { code: ["no certificate has this code"] });
  return NextResponse.json(openBadgeCredential(verification, publicBaseUrl()), {
    headers: { "Content-Type": "application/ld+json; charset=utf-8", "Cache-Control": "no-store" },
  });
});
