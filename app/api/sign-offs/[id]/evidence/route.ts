import { NextResponse } from "next/server";
import { requireActor } from "@/lib/auth/session";
import { route } from "@/lib/http/route";
import { readUploadedFile, sniffImageType } from "@/lib/http/upload";
import { addEvidencePhoto, assertCanAddEvidence, maxEvidenceBytes } from "@/lib/data/evidence";
import { evidenceMediaTypes } from "@/models/EvidencePhoto";

export const dynamic = "force-dynamic";

interface Context {
  params: Promise<{ id: string }>;
}

/**
 * A coach adds a photo to a waiting sign-off: multipart/form-data, field "file", JPEG, PNG or WebP up to
 * 8 MB. Permission is checked before the body is read; 413 when too large (declared or counted), 415
 * when the bytes are not an allowed image whatever the name says. 201 with the photo's id and address.
 */
export const POST = route<Context>(async (request, { params }) => {
  const { id } = await params;
  const actor = await requireActor();
  await assertCanAddEvidence(actor, id);
  const bytes = await readUploadedFile(request, { maxBytes: maxEvidenceBytes });
  const mediaType = await sniffImageType(bytes, evidenceMediaTypes, "A photo");
  const photo = await addEvidencePhoto(actor, id, bytes, mediaType);
  return NextResponse.json({ id: photo.id, url: photo.url }, { status: 201 });
});
