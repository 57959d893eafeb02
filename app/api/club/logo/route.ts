import { NextResponse } from "next/server";
import { requireActor } from "@/lib/auth/session";
import { assertAllowed, canManageClub } from "@/lib/auth/permissions";
import { NotFoundError } from "@/lib/http/errors";
import { route } from "@/lib/http/route";
import { readUploadedFile, sniffImageType } from "@/lib/http/upload";
import { clubLogoTypes, maxClubLogoBytes, readClubLogo, removeClubLogo, storeClubLogo } from "@/lib/data/club-logo";

export const dynamic = "force-dynamic";

/** The club's logo for its members (404 when there is none). */
export const GET = route(async () => {
  const actor = await requireActor();
  const logo = await readClubLogo(actor.clubId);
  if (!logo) throw new NotFoundError();
  return new NextResponse(Buffer.from(logo.bytes), {
    headers: {
      "Content-Type": logo.type,
      "Content-Disposition": `inline; filename="club-logo.${logo.type === "image/png" ? "png" : "jpg"}"`,
      "X-Content-Type-Options": "nosniff",
      "Cache-Control": "private, no-store",
    },
  });
});

/** Admins upload the logo: multipart field "file", PNG or JPEG sniffed from the bytes, at most 2 MB. */
export const POST = route(async (request) => {
  const actor = await requireActor();
  assertAllowed(canManageClub(actor, actor.clubId), "Only club administrators can change the logo.");
  const bytes = await readUploadedFile(request, { maxBytes: maxClubLogoBytes });
  const type = await sniffImageType(bytes, clubLogoTypes, "a club logo");
  await storeClubLogo(actor, bytes, type);
  return NextResponse.json({ ok: true }, { status: 201 });
});

/** Admins remove the logo: 204. */
export const DELETE = route(async () => {
  const actor = await requireActor();
  await removeClubLogo(actor);
  return new NextResponse(null, { status: 204 });
});
