import { NextResponse } from "next/server";
import { requireActor } from "@/lib/auth/session";
import { route } from "@/lib/http/route";
import { deleteEvidencePhoto, readEvidencePhoto } from "@/lib/data/evidence";

export const dynamic = "force-dynamic";

interface Context {
  params: Promise<{ id: string }>;
}

/** A sign-off photo, for its athlete and the coaches and admins of their club only (404 for anyone else). */
export const GET = route<Context>(async (_request, { params }) => {
  const { id } = await params;
  const actor = await requireActor();
  const photo = await readEvidencePhoto(actor, id);
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
  const { id } = await params;
  const actor = await requireActor();
  await deleteEvidencePhoto(actor, id);
  return new NextResponse(null, { status: 204 });
});
