import { requireActor } from "@/lib/auth/session";
import { route } from "@/lib/http/route";
import { registerCsv, registerFor } from "@/lib/data/register";
import { csvDownloadHeaders } from "@/lib/csv/export";
import { queryObject, registerFilterSchema } from "@/lib/validations/certification";

export const dynamic = "force-dynamic";

/** Admins: the induction register as CSV, with the page's filters (?module=&kind=&status=&from=&to=). */
export const GET = route(async (request) => {
  const actor = await requireActor();
  const filter = registerFilterSchema.parse(queryObject(new URL(request.url).searchParams));
  const register = await registerFor(actor, filter);
  return new Response(registerCsv(register), {
    headers: csvDownloadHeaders(`induction-register-${new Date().toISOString().slice(0, 10)}.csv`),
  });
});
