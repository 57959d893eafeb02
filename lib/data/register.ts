import "server-only";
import { Op, type WhereOptions } from "sequelize";
import { databaseReady } from "@/lib/data/database";
import { summarise, suspendedAthletes, type CertificateSummary } from "@/lib/data/certificates";
import { todayOfClub } from "@/lib/data/club-settings";
import { assertMaySeeRegister, type Actor } from "@/lib/auth/permissions";
import { listModules } from "@/lib/content/modules";
import { certificateStatusLabels } from "@/lib/certificates/status";
import { toCsv, type CsvColumn } from "@/lib/csv/export";
import type { RegisterFilter } from "@/lib/validations/certification";
import { pdfFonts } from "@/lib/pdf/fonts";
import { renderRegisterPdf } from "@/lib/pdf/register";
import { Certificate, Club } from "@/models";

export interface Register {
  clubName: string;
  /** The day the register was listed: statuses are as of this day, and the PDF says it was generated on it. */
  generatedOn: string;
  filter: RegisterFilter;
  summary: string;
  entries: CertificateSummary[];
}

/** Every certificate the club issued that matches the filters, in serial order (admins of the club). A module filter keeps that module's certificates only. */
export async function registerFor(actor: Actor, filter: RegisterFilter): Promise<Register> {
  await databaseReady();
  assertMaySeeRegister(actor);
  const where: WhereOptions<Certificate> = { clubId: actor.clubId };
  const issuedOn: Record<symbol, string> = {};
  if (filter.from) issuedOn[Op.gte] = filter.from;
  if (filter.to) issuedOn[Op.lte] = filter.to;
  const conditions: WhereOptions<Certificate>[] = [where];
  if (filter.from || filter.to) conditions.push({ issuedOn });
  if (filter.kind !== "all") conditions.push({ kind: filter.kind });
  if (filter.module) conditions.push({ moduleSlug: filter.module });
  const [club, certificates] = await Promise.all([
    Club.findByPk(actor.clubId),
    Certificate.findAll({
      where: { [Op.and]: conditions },
      order: [
        ["serialYear", "ASC"],
        ["serialNumber", "ASC"],
      ],
    }),
  ]);
  const suspended = await suspendedAthletes(certificates.filter((entry) => entry.kind === "clearance").map((entry) => entry.athleteId));
  const today = todayOfClub(club);
  const entries = certificates
    .map((certificate) => summarise(certificate, today, suspended.has(certificate.athleteId)))
    .filter((entry) => filter.status === "all" || entry.status === filter.status);
  return {
    clubName: club?.name ?? "",
    generatedOn: today,
    filter,
    summary: registerFilterSummary(filter),
    entries,
  };
}

/** The filters in words, printed on every page of the register. */
export function registerFilterSummary(filter: RegisterFilter): string {
  const title = filter.module ? (listModules().find((meta) => meta.slug === filter.module)?.title ?? filter.module) : "All modules";
  const kind = {
    all: "module and clearance certificates",
    module: "module certificates",
    clearance: "clearance certificates",
  }[filter.kind];
  const status = filter.status === "all" ? "any status" : certificateStatusLabels[filter.status].label.toLowerCase();
  const dates = filter.from || filter.to ? `issued ${filter.from || "from the start"} to ${filter.to || "today"}` : "all dates";
  return `${title} · ${kind} · ${status} · ${dates}`;
}

const registerColumns: CsvColumn<CertificateSummary>[] = [
  { header: "Serial", value: (entry) => entry.serial },
  { header: "Kind", value: (entry) => (entry.kind === "module" ? "Module" : "Rigging clearance") },
  { header: "Athlete", value: (entry) => entry.athleteName },
  { header: "Certificate", value: (entry) => entry.title },
  { header: "Signed off by", value: (entry) => entry.signedOffByName },
  { header: "Issued", value: (entry) => entry.issuedOn },
  { header: "Expires", value: (entry) => entry.expiresOn },
  { header: "Status", value: (entry) => certificateStatusLabels[entry.status].label },
  { header: "Revocation reason", value: (entry) => entry.revokeReason ?? "" },
  { header: "Verification address", value: (entry) => entry.verifyUrl },
];

/** The register as CSV (formula-escaped by toCsv). */
export function registerCsv(register: Register): string {
  return toCsv(register.entries, registerColumns);
}

/** The register as a print-ready A4 PDF with a signature column. */
export async function registerPdf(register: Register): Promise<Uint8Array> {
  return renderRegisterPdf(
    {
      clubName: register.clubName,
      filterSummary: register.summary,
      generatedOn: register.generatedOn,
      rows: register.entries.map((entry) => ({
        serial: entry.serial,
        athleteName: entry.athleteName,
        title: entry.title,
        signedOffByName: entry.signedOffByName,
        issuedOn: entry.issuedOn,
        expiresOn: entry.expiresOn,
        status: certificateStatusLabels[entry.status].label,
      })),
    },
    await pdfFonts(),
  );
}
