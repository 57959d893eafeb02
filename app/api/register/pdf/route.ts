import { NextResponse } from "next/server";
import { assertMaySeeRegister } from "@/lib/auth/permissions";
import { requireActor } from "@/lib/auth/session";
import { readQuery, route } from "@/lib/http/route";
import { listModules } from "@/lib/content/modules";
import { registerFor, registerPdf } from "@/lib/data/register";
import { registerQuerySchemaFor } from "@/lib/validations/certification";

export const dynamic = "force-dynamic";

/** Admins: the induction register as a print-ready A4 PDF, with the page's filters (strict, as for the CSV). */
export const GET = route(async (request) => {
  const actor = await requireActor();
  assertMaySeeRegister(actor);
  const filter = readQuery(request, registerQuerySchemaFor(listModules().map((meta) => meta.slug)));
  const register = await registerFor(actor, filter);
  const bytes = await registerPdf(register);
  return new NextResponse(Buffer.from(bytes), {
    headers: {
      "Content-Type": "application/pdf",
      "Content-Disposition": `attachment; filename="induction-register-${register.generatedOn}.pdf"`,
      "X-Content-Type-Options": "nosniff",
      "Cache-Control": "private, no-store",
    },
  });
});
