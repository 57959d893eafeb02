import { assertMaySeeRegister } from "@/lib/auth/permissions";
import { requireActor } from "@/lib/auth/session";
import { readQuery, route } from "@/lib/http/route";
import { listModules } from "@/lib/content/modules";
import { registerCsv, registerFor } from "@/lib/data/register";
import { csvDownloadHeaders } from "@/lib/csv/export";
import { registerQuerySchemaFor } from "@/lib/validations/certification";

export const dynamic = "force-dynamic";

/** Admins: the induction register as CSV, with the page's filters (?module=&kind=&status=&from=&to=; strict, 400 naming a bad one). */
export const GET = route(async (request) => {
  const actor = await requireActor();
  assertMaySeeRegister(actor);
  const filter = readQuery(request, registerQuerySchemaFor(listModules().map((meta) => meta.slug)));
  const register = await registerFor(actor, filter);
  return new Response(registerCsv(register), {
    headers: csvDownloadHeaders(`induction-register-${register.generatedOn}.csv`),
  });
});
