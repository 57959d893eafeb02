import { NextResponse } from "next/server";
import { requireActor } from "@/lib/auth/session";
import { lookUpBy } from "@/lib/http/look-up";
import { readParams, route } from "@/lib/http/route";
import { signOffIdParamSchema } from "@/lib/validations/certification";
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
 * when the bytes are not an allowed image whatever the name says; 400 naming the field for a malformed
 * sign-off id or a missing or unreadable file part. 201 with the photo's id and address.
 */
export const POST = route<Context>(async (request, { params }) => {
  const actor = await requireActor();
  const { id } = await readParams(params, signOffIdParamSchema);
  await lookUpBy("id", "sign-off", () => assertCanAddEvidence(actor, id));
  const bytes = await readUploadedFile(request, { maxBytes: maxEvidenceBytes });
  const mediaType = await sniffImageType(bytes, evidenceMediaTypes, "a photo");
  const photo = await addEvidencePhoto(actor, id, bytes, mediaType);
  return NextResponse.json({ id: photo.id, url: photo.url }, { status: 201 });
});
