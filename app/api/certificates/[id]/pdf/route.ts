import { NextResponse } from "next/server";
import { requireActor } from "@/lib/auth/session";
import { route } from "@/lib/http/route";
import { certificatePdfFor } from "@/lib/data/certificates";

export const dynamic = "force-dynamic";

interface Context {
  params: Promise<{ id: string }>;
}

/** A certificate as PDF, for its athlete and the coaches and admins of their club (404 for anyone else). */
export const GET = route<Context>(async (_request, { params }) => {
  const { id } = await params;
  const actor = await requireActor();
  const { bytes, fileName } = await certificatePdfFor(actor, id);
  return new NextResponse(Buffer.from(bytes), {
    headers: {
      "Content-Type": "application/pdf",
      "Content-Disposition": `attachment; filename="${fileName}"`,
      "X-Content-Type-Options": "nosniff",
      "Cache-Control": "private, no-store",
    },
  });
});
