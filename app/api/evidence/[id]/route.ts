import { NextResponse } from "next/server";
import { requireActor } from "@/lib/auth/session";
import { lookUpBy } from "@/lib/http/look-up";
import { readParams, route } from "@/lib/http/route";
import { evidenceIdParamSchema } from "@/lib/validations/certification";
import { deleteEvidencePhoto, readEvidencePhoto } from "@/lib/data/evidence";

export const dynamic = "force-dynamic";

interface Context {
  params: Promise<{ id: string }>;
}

/**
 * A sign-off photo, for its athlete and the coaches and admins of their club only (404 for anyone else;
 * 400 for an id that is not a UUID). The query string is ignored.
 */
export const GET = route<Context>(async (_request, { params }) => {
  const actor = await requireActor();
  const { id } = await readParams(params, evidenceIdParamSchema);
  const photo = await lookUpBy("id", "photo", () => readEvidencePhoto(actor, id));
  return new NextResponse(Buffer.from(photo.bytes), {
    headers: {
      "Content-Type": photo.mediaType,
      "Content-Length": String(photo.bytes.byteLength),
      "Content-Disposition": `inline; filename="${photo.fileName}"`,
      "X-Content-Type-Options": "nosniff",
      "Cache-Control": "private, no-store",
      "Content-Security-Policy": "default-src 'none'; sandbox",
    },
  });
});

/** A coach removes a photo from a sign-off that is still waiting: 204. */
export const DELETE = route<Context>(async (_request, { params }) => {
  const actor = await requireActor();
  const { id } = await readParams(params, evidenceIdParamSchema);
  await lookUpBy("id", "photo", () => deleteEvidencePhoto(actor, id));
  return new NextResponse(null, { status: 204 });
});
