import { NextResponse } from "next/server";
import { requireActor } from "@/lib/auth/session";
import { lookUpBy } from "@/lib/http/look-up";
import { readParams, route } from "@/lib/http/route";
import { certificateIdParamSchema } from "@/lib/validations/certification";
import { certificatePdfFor } from "@/lib/data/certificates";

export const dynamic = "force-dynamic";

interface Context {
  params: Promise<{ id: string }>;
}

/**
 * A certificate as PDF, for its athlete and the coaches and admins of their club (404 for anyone else;
 * 400 for an id that is not a UUID). The query string is ignored.
 */
export const GET = route<Context>(async (_request, { params }) => {
  const actor = await requireActor();
  const { id } = await readParams(params, certificateIdParamSchema);
  const { bytes, fileName } = await lookUpBy("id", "certificate", () => certificatePdfFor(actor, id));
  return new NextResponse(Buffer.from(bytes), {
    headers: {
      "Content-Type": "application/pdf",
      "Content-Disposition": `attachment; filename="${fileName}"`,
      "X-Content-Type-Options": "nosniff",
      "Cache-Control": "private, no-store",
    },
  });
});
