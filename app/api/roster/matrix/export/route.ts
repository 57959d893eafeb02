import { assertMaySeeRoster } from "@/lib/auth/permissions";
import { requireActor } from "@/lib/auth/session";
import { readQuery, route } from "@/lib/http/route";
import { rosterMatrix } from "@/lib/data/clearance";
import { csvDownloadHeaders, toCsv, type CsvColumn } from "@/lib/csv/export";
import { rosterRowMatches, type RosterRow } from "@/lib/clearance/roster";
import { clearanceStateLabels, moduleStatusLabels } from "@/lib/clearance/rules";
import { expiryVerb } from "@/lib/clearance/dates";
import { rosterExportQuerySchema } from "@/lib/validations/certification";

export const dynamic = "force-dynamic";

/** The roster view as CSV, with the same filter and name search as the page (?filter=…&q=…; strict, 400 naming a bad parameter). */
export const GET = route(async (request) => {
  const actor = await requireActor();
  assertMaySeeRoster(actor);
  const query = readQuery(request, rosterExportQuerySchema);
  const matrix = await rosterMatrix(actor);
  const rows = matrix.athletes.filter((row) => rosterRowMatches(row, query.filter, query.q, matrix.today));
  const columns: CsvColumn<RosterRow>[] = [
    { header: "Athlete", value: (row) => row.name },
    { header: "E-mail", value: (row) => row.email },
    { header: "Clearance", value: (row) => clearanceStateLabels[row.clearance.state].label },
    { header: "Clearance expires", value: (row) => row.clearance.expiresOn ?? "" },
    { header: "Suspension reason", value: (row) => row.clearance.suspendedReason ?? "" },
    ...matrix.modules.map((module): CsvColumn<RosterRow> => ({
      header: module.title,
      value: (row) => {
        const cell = row.modules[module.slug];
        if (!cell) return "";
        return cell.expiresOn
          ? `${moduleStatusLabels[cell.status].label} (${expiryVerb(cell.expiresOn, matrix.today)} ${cell.expiresOn})`
          : moduleStatusLabels[cell.status].label;
      },
    })),
    { header: "Waiting for my sign-off", value: (row) => row.waitingForMe },
  ];
  return new Response(toCsv(rows, columns), {
    headers: csvDownloadHeaders(`roster-${query.filter}-${matrix.today}.csv`),
  });
});
