import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { execFileSync } from "node:child_process";
import { randomUUID } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { PDFDocument } from "pdf-lib";
import { createTempDataDir } from "@/tests/support/temp-data-dir";
import type { Actor } from "@/lib/auth/permissions";

const session = vi.hoisted(() => ({ actor: null as Actor | null }));
vi.mock("@/lib/auth/session", async () => {
  const { UnauthenticatedError } = await import("@/lib/http/errors");
  return {
    currentActor: async () => session.actor,
    requireActor: async () => {
      if (!session.actor) throw new UnauthenticatedError();
      return session.actor;
    },
  };
});

const dataDir = createTempDataDir("certification");

const { closeDatabase, getSequelize, writeTransaction } = await import("@/lib/db");
const { databaseReady } = await import("@/lib/data/database");
const { seedDemoClub } = await import("@/lib/seed/demo-club");
const { quizStandingFor, startOrResumeAttempt, submitAttempt } = await import("@/lib/data/learning");
const signOffs = await import("@/lib/data/sign-offs");
const certificates = await import("@/lib/data/certificates");
const clearance = await import("@/lib/data/clearance");
const register = await import("@/lib/data/register");
const { listOutbox } = await import("@/lib/mail/outbox");
const { renderRegisterPdf, registerRowsPerPage } = await import("@/lib/pdf/register");
const { pdfFonts } = await import("@/lib/pdf/fonts");
const { listModules } = await import("@/lib/content/modules");
const { rosterRowMatches } = await import("@/lib/clearance/roster");
const { isoDateOf } = await import("@/lib/clearance/dates");
const { machineTimeZone, midnightInZone } = await import("@/lib/care/calendar");
const { passExpiresOn } = await import("@/lib/clearance/rules");
const { Club, QuizAttempt, User, AuditEvent, Certificate } = await import("@/models");
const { ConflictError, ForbiddenError, NotFoundError, ValidationError } = await import("@/lib/http/errors");
const evidenceRoute = await import("@/app/api/sign-offs/[id]/evidence/route");
const evidenceFileRoute = await import("@/app/api/evidence/[id]/route");
const pdfRoute = await import("@/app/api/certificates/[id]/pdf/route");
const verifyRoute = await import("@/app/api/verify/[code]/route");
const logoRoute = await import("@/app/api/club/logo/route");
const matrixExportRoute = await import("@/app/api/roster/matrix/export/route");
const registerCsvRoute = await import("@/app/api/register/csv/route");
const registerPdfRoute = await import("@/app/api/register/pdf/route");

const tinyPng = Buffer.from("iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNk+M9QDwADhgGAWjR9awAAAABJRU5ErkJggg==", "base64");
// The demo club sets no time zone: its day is the machine's (the e2e server's too).
const today = isoDateOf(new Date(), machineTimeZone());
const year = Number(today.slice(0, 4));

async function actorFor(email: string): Promise<Actor> {
  const user = await User.findOne({ where: { email } });
  return { id: user!.id, clubId: user!.clubId, role: user!.role, name: user!.name, email: user!.email };
}

/** Takes a module's quiz through the real attempt functions, answering from the stored answers. */
async function passQuiz(actor: Actor, slug: string): Promise<void> {
  const opening = await startOrResumeAttempt(actor, slug);
  const attempt = await QuizAttempt.findByPk(opening.attemptId);
  const answers = Object.fromEntries(attempt!.questions.map((question) => [question.id, question.answer]));
  const result = await submitAttempt(actor, opening.attemptId, answers);
  expect(result.passed).toBe(true);
}

function allMet(slug: string): Record<string, "met"> {
  const meta = listModules().find((entry) => entry.slug === slug)!;
  return Object.fromEntries(meta.checklist.map((item) => [item.id, "met" as const]));
}

function pdfText(bytes: Uint8Array): string {
  const file = path.join(os.tmpdir(), `slipway-test-${Date.now()}-${Math.random().toString(36).slice(2)}.pdf`);
  fs.writeFileSync(file, bytes);
  return execFileSync("pdftotext", ["-layout", file, "-"], { encoding: "utf8" });
}

/** Renders page 1 in grey at 30 dpi and returns the share of pixels that are not white. */
function inkedShareOfFirstPage(bytes: Uint8Array): number {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "slipway-png-"));
  const file = path.join(dir, "in.pdf");
  fs.writeFileSync(file, bytes);
  execFileSync("pdftoppm", ["-r", "30", "-gray", "-f", "1", "-l", "1", "-singlefile", file, path.join(dir, "page")]);
  const pgm = fs.readFileSync(path.join(dir, "page.pgm"));
  const header = /^P5\s+(\d+)\s+(\d+)\s+255\s/.exec(pgm.subarray(0, 40).toString("latin1"));
  expect(header).not.toBeNull();
  const pixels = pgm.subarray(header![0].length);
  let inked = 0;
  for (const value of pixels) if (value < 200) inked += 1;
  // Also render a PNG, as the README promises, so a broken font shows to whoever opens it.
  execFileSync("pdftoppm", ["-r", "30", "-png", "-f", "1", "-l", "1", "-singlefile", file, path.join(dir, "page")]);
  expect(fs.statSync(path.join(dir, "page.png")).size).toBeGreaterThan(1000);
  return inked / pixels.length;
}

function multipart(bytes: Buffer | string, fileName: string, type: string): { body: FormData } {
  const form = new FormData();
  form.append("file", new File([typeof bytes === "string" ? bytes : new Uint8Array(bytes)], fileName, { type }));
  return { body: form };
}

async function signOffAll(athlete: Actor, coach: Actor, slug: string, evidenceIds: string[] = []) {
  session.actor = athlete;
  const { assessmentId } = await signOffs.requestSignOff(athlete, { moduleSlug: slug, coachId: null });
  return {
    assessmentId,
    recorded: await signOffs.recordAssessment(coach, assessmentId, {
      items: allMet(slug),
      note: "Tidy and careful.",
      evidenceIds,
    }),
  };
}

let admin: Actor;
let coach: Actor;
let carys: Actor;
let dev: Actor;
let foreignCoach: Actor;

beforeAll(async () => {
  await databaseReady();
  await seedDemoClub(getSequelize());
  admin = await actorFor("admin@lantern-reach.example");
  coach = await actorFor("coach.tobias@lantern-reach.example");
  carys = await actorFor("carys@lantern-reach.example");
  dev = await actorFor("dev@lantern-reach.example");
  const other = await writeTransaction(async (transaction) => {
    const club = await Club.create({ name: "Heron Bend Sculling Club", slug: "heron-bend", settings: {} }, { transaction });
    return User.create({ clubId: club.id, email: "coach@heron-bend.example", name: "Other Coach", role: "coach" }, { transaction });
  });
  foreignCoach = { id: other.id, clubId: other.clubId, role: "coach", name: other.name, email: other.email };
});

afterAll(async () => {
  await closeDatabase();
});

describe("practical sign-off", () => {
  let assessmentId = "";

  it("is refused before the module's quiz is passed", async () => {
    const early = signOffs.requestSignOff(carys, { moduleSlug: "overall-length", coachId: null });
    await expect(early).rejects.toBeInstanceOf(ConflictError);
    await expect(early).rejects.toMatchObject({ fieldErrors: { moduleSlug: [expect.stringMatching(/quiz first/)] } });
    await expect(signOffs.requestSignOff(carys, { moduleSlug: "no-such-module", coachId: null })).rejects.toBeInstanceOf(NotFoundError);
  });

  it("is asked for after the quiz, mails the chosen coach and appears in the queue", async () => {
    await passQuiz(carys, "overall-length");
    await expect(signOffs.requestSignOff(carys, { moduleSlug: "overall-length", coachId: dev.id })).rejects.toBeInstanceOf(ValidationError);
    ({ assessmentId } = await signOffs.requestSignOff(carys, {
      moduleSlug: "overall-length",
      coachId: coach.id,
    }));
    await expect(signOffs.requestSignOff(carys, { moduleSlug: "overall-length", coachId: null })).rejects.toThrow(/already asked/);
    const [mail] = await listOutbox();
    expect(mail?.to).toBe(coach.email);
    expect(mail?.text).toContain(`/roster/sign-offs/${assessmentId}`);
    const queue = await signOffs.signOffQueue(coach);
    expect(queue).toEqual([expect.objectContaining({ id: assessmentId, athleteName: "Carys Penhallow", forMe: true })]);
    const ines = await actorFor("coach.ines@lantern-reach.example");
    expect((await signOffs.signOffQueue(ines))[0]?.forMe).toBe(false);
    expect((await signOffs.practicalViewFor(carys, "overall-length")).status).toBe("waiting-for-sign-off");
  });

  it("can only be assessed by a coach of the athlete's club", async () => {
    const input = { items: allMet("overall-length"), note: "" };
    await expect(signOffs.recordAssessment(carys, assessmentId, input)).rejects.toBeInstanceOf(ForbiddenError);
    await expect(signOffs.recordAssessment(dev, assessmentId, input)).rejects.toBeInstanceOf(NotFoundError);
    await expect(signOffs.recordAssessment(foreignCoach, assessmentId, input)).rejects.toBeInstanceOf(NotFoundError);
    await expect(signOffs.assessmentForCoach(foreignCoach, assessmentId)).rejects.toBeInstanceOf(NotFoundError);
    await expect(signOffs.signOffQueue(carys)).rejects.toBeInstanceOf(ForbiddenError);
  });

  it("checks the form on the server with the module's checklist", async () => {
    await expect(
      signOffs.recordAssessment(coach, assessmentId, { items: { "measures-tip-to-end": "met" }, note: "" }),
    ).rejects.toBeInstanceOf(ValidationError);
    const items = { ...allMet("overall-length"), "moves-handle": "not-yet" };
    await expect(signOffs.recordAssessment(coach, assessmentId, { items, note: "" })).rejects.toThrow(/practise/);
    await expect(
      signOffs.recordAssessment(coach, assessmentId, {
        items: allMet("overall-length"),
        note: "",
        evidenceIds: ["8c0a3f8e-6b0e-4d0a-9c55-2f1f1d7f6a11"],
      }),
    ).rejects.toThrow(/does not belong/);
  });

  it("'not yet' sends the athlete back with the note, by e-mail and on their page", async () => {
    const items = { ...allMet("overall-length"), "moves-handle": "not-yet" };
    const recorded = await signOffs.recordAssessment(coach, assessmentId, {
      items,
      note: "Loosen the handle clamp fully before sliding it.",
    });
    expect(recorded).toMatchObject({ outcome: "not-yet", certificates: [], mailed: true });
    await expect(signOffs.recordAssessment(coach, assessmentId, { items: allMet("overall-length"), note: "" })).rejects.toBeInstanceOf(
      ConflictError,
    );
    const view = await signOffs.practicalViewFor(carys, "overall-length");
    expect(view).toMatchObject({
      status: "not-yet",
      requestProblem: null,
      latestDecision: { outcome: "not-yet", note: "Loosen the handle clamp fully before sliding it." },
    });
    const [mail] = await listOutbox();
    expect(mail).toMatchObject({
      to: carys.email,
      subject: "Not yet: Measuring and setting the overall length",
    });
    expect(mail?.text).toContain("Loosen the handle clamp fully");
  });

  it("all items met passes the module and issues a numbered certificate, mailed as a PDF", async () => {
    session.actor = carys;
    ({ assessmentId } = await signOffs.requestSignOff(carys, {
      moduleSlug: "overall-length",
      coachId: null,
    }));
    const recorded = await signOffs.recordAssessment(coach, assessmentId, {
      items: allMet("overall-length"),
      note: "Careful and quick.",
    });
    expect(recorded.outcome).toBe("passed");
    expect(recorded.certificates).toEqual([expect.objectContaining({ kind: "module", serial: `LR-${year}-0001` })]);
    const view = await signOffs.practicalViewFor(carys, "overall-length");
    expect(view.status).toBe("passed");
    expect(view.currentPass).toEqual({ signedOffOn: today, expiresOn: passExpiresOn(today, 12) });
    expect(view.requestProblem).toMatch(/renew/);
    const [mail] = await listOutbox();
    expect(mail).toMatchObject({ to: carys.email, attachments: [`slipway-certificate-LR-${year}-0001.pdf`] });
    expect(await AuditEvent.count({ where: { action: "practical.signed-off" } })).toBe(1);
  });

  it("numbers certificates sequentially per club and year", async () => {
    await passQuiz(carys, "setting-inboard");
    const { recorded } = await signOffAll(carys, coach, "setting-inboard");
    expect(recorded.certificates.map((entry) => entry.serial)).toEqual([`LR-${year}-0002`]);
    const serials = (await Certificate.findAll({ where: { clubId: carys.clubId } })).map((entry) => entry.serialNumber);
    expect(new Set(serials).size).toBe(serials.length);
  });
});

describe("clearance, suspension, revocation and verification", () => {
  let clearanceCode = "";
  let moduleCertificateId = "";
  let moduleCode = "";

  it("issues the clearance certificate when the last required module is passed", async () => {
    for (const slug of ["changing-boats", "secure-and-check"]) {
      await passQuiz(carys, slug);
      await signOffAll(carys, coach, slug);
    }
    expect((await clearance.clearanceOf(carys)).standing.clearance.cleared).toBe(false);
    await passQuiz(carys, "grip-cleaning");
    const { recorded } = await signOffAll(carys, coach, "grip-cleaning");
    expect(recorded.certificates.map((entry) => entry.kind)).toEqual(["module", "clearance"]);
    const { standing } = await clearance.clearanceOf(carys);
    expect(standing.clearance).toMatchObject({ state: "cleared", expiresOn: passExpiresOn(today, 12) });
    const [mail] = await listOutbox();
    expect(mail?.subject).toMatch(/may now rig unsupervised/);
    expect(mail?.attachments).toHaveLength(2);
    const mine = await certificates.certificatesOfAthlete(carys, carys.id);
    const clearanceCertificate = mine.find((entry) => entry.kind === "clearance")!;
    clearanceCode = clearanceCertificate.verifyUrl.split("/verify/")[1]!;
    const first = mine.find((entry) => entry.serial === `LR-${year}-0001`)!;
    moduleCertificateId = first.id;
    moduleCode = first.verifyUrl.split("/verify/")[1]!;
    expect(clearanceCode).toMatch(/^[A-Za-z0-9_-]{24}$/);
  });

  it("shows the athlete as cleared on the roster and in its CSV export", async () => {
    const matrix = await clearance.rosterMatrix(coach);
    const row = matrix.athletes.find((entry) => entry.id === carys.id)!;
    expect(row.clearance.state).toBe("cleared");
    expect(rosterRowMatches(row, "cleared", "car", matrix.today)).toBe(true);
    expect(matrix.athletes.filter((entry) => rosterRowMatches(entry, "cleared", "", matrix.today)).map((entry) => entry.name)).toEqual([
      "Carys Penhallow",
    ]);
    await expect(clearance.rosterMatrix(carys)).rejects.toBeInstanceOf(ForbiddenError);
    session.actor = coach;
    const response = await matrixExportRoute.GET(new Request("http://test/api/roster/matrix/export?filter=cleared"), undefined);
    expect(response.status).toBe(200);
    const csv = await response.text();
    expect(csv.split("\r\n")).toHaveLength(2);
    expect(csv).toContain("Carys Penhallow");
    expect(csv).toContain("May rig unsupervised");
  });

  it("is suspended and lifted by a coach with a reason, audited", async () => {
    await expect(clearance.suspendClearance(carys, carys.id, "Not allowed")).rejects.toBeInstanceOf(ForbiddenError);
    await expect(clearance.suspendClearance(dev, carys.id, "Not allowed")).rejects.toBeInstanceOf(NotFoundError);
    await expect(clearance.suspendClearance(foreignCoach, carys.id, "Not allowed")).rejects.toBeInstanceOf(NotFoundError);
    await clearance.suspendClearance(coach, carys.id, "Collar found loose at launch");
    await expect(clearance.suspendClearance(coach, carys.id, "again")).rejects.toBeInstanceOf(ConflictError);
    expect((await clearance.clearanceOf(coach, carys.id)).standing.clearance.state).toBe("suspended");
    expect((await certificates.verifyCode(clearanceCode))?.status).toBe("suspended");
    await clearance.liftSuspension(coach, carys.id, "Re-checked with her at the rack");
    expect((await clearance.clearanceOf(coach, carys.id)).standing.clearance.state).toBe("cleared");
    expect((await certificates.verifyCode(clearanceCode))?.status).toBe("valid");
    expect(await AuditEvent.count({ where: { action: ["clearance.suspended", "clearance.lifted"] } })).toBe(2);
  });

  it("verifies a code publicly with only name, module and dates; unknown codes are just not found", async () => {
    const verification = await certificates.verifyCode(moduleCode);
    expect(verification).toMatchObject({
      status: "valid",
      athleteName: "Carys Penhallow",
      title: "Measuring and setting the overall length",
      issuedOn: today,
    });
    expect(await certificates.verifyCode(`${moduleCode.slice(0, -1)}${moduleCode.endsWith("A") ? "B" : "A"}`)).toBeNull();
    expect(await certificates.verifyCode("../../etc/passwd")).toBeNull();
    const response = await verifyRoute.GET(new Request(`http://test/api/verify/${moduleCode}`), {
      params: Promise.resolve({ code: moduleCode }),
    });
    const badge = (await response.json()) as Record<string, unknown>;
    expect(badge).toMatchObject({
      type: ["VerifiableCredential", "OpenBadgeCredential"],
      // The club's midnight starting the issue day; the demo club has the server's zone.
      validFrom: midnightInZone(today, machineTimeZone()),
    });
    expect((badge["@context"] as string[])[0]).toBe("https://www.w3.org/ns/credentials/v2");
    const unknown = await verifyRoute.GET(new Request("http://test/api/verify/x"), {
      params: Promise.resolve({ code: "AAAAAAAAAAAAAAAAAAAAAAAA" }),
    });
    expect(unknown.status).toBe(404);
  });

  it("lets only admins revoke, and a revoked module certificate takes the clearance certificate with it", async () => {
    await expect(certificates.revokeCertificate(coach, moduleCertificateId, "Issued in error")).rejects.toBeInstanceOf(ForbiddenError);
    const result = await certificates.revokeCertificate(admin, moduleCertificateId, "Signed off on the wrong athlete");
    expect(result.revoked).toHaveLength(2);
    expect((await certificates.verifyCode(moduleCode))?.status).toBe("revoked");
    expect((await certificates.verifyCode(clearanceCode))?.status).toBe("revoked");
    await expect(certificates.revokeCertificate(admin, moduleCertificateId, "again")).rejects.toBeInstanceOf(ConflictError);
    const standing = (await clearance.clearanceOf(carys)).standing;
    expect(standing.clearance.state).toBe("not-cleared");
    expect(standing.modules.find((entry) => entry.slug === "overall-length")?.status).toBe("ready-for-sign-off");
  });
});

describe("certificate and register PDFs", () => {
  it("renders the certificate on one A4 page with athlete, module, serial and verification address", async () => {
    const mine = await certificates.certificatesOfAthlete(carys, carys.id);
    const entry = mine.find((certificate) => certificate.serial === `LR-${year}-0002`)!;
    session.actor = carys;
    const response = await pdfRoute.GET(new Request("http://test"), {
      params: Promise.resolve({ id: entry.id }),
    });
    expect(response.status).toBe(200);
    expect(response.headers.get("content-type")).toBe("application/pdf");
    expect(response.headers.get("content-disposition")).toContain(`slipway-certificate-LR-${year}-0002.pdf`);
    const bytes = new Uint8Array(await response.arrayBuffer());
    const document = await PDFDocument.load(bytes);
    expect(document.getPageCount()).toBe(1);
    const { width, height } = document.getPage(0).getSize();
    expect([Math.round(width), Math.round(height)]).toEqual([595, 842]);
    const text = pdfText(bytes);
    for (const expected of [
      "Carys Penhallow",
      "Setting the inboard with the collar",
      `LR-${year}-0002`,
      entry.verifyUrl,
      "Tobias Lindqvist",
      "Lantern Reach Rowing Club",
    ]) {
      expect(text).toContain(expected);
    }
    expect(inkedShareOfFirstPage(bytes)).toBeGreaterThan(0.02);
  });

  it("answers 404 for another athlete's certificate", async () => {
    const mine = await certificates.certificatesOfAthlete(carys, carys.id);
    session.actor = dev;
    const response = await pdfRoute.GET(new Request("http://test"), {
      params: Promise.resolve({ id: mine[0]!.id }),
    });
    expect(response.status).toBe(404);
    await expect(certificates.certificatesOfAthlete(dev, carys.id)).rejects.toBeInstanceOf(NotFoundError);
  });

  it("lists the register for admins only, filtered by module and status", async () => {
    await expect(register.registerFor(coach, { module: "", kind: "all", status: "all", from: "", to: "" })).rejects.toBeInstanceOf(
      ForbiddenError,
    );
    const all = await register.registerFor(admin, {
      module: "",
      kind: "all",
      status: "all",
      from: "",
      to: "",
    });
    expect(all.entries.map((entry) => entry.serial)).toEqual(Array.from({ length: 6 }, (_, index) => `LR-${year}-000${index + 1}`));
    const revoked = await register.registerFor(admin, {
      module: "",
      kind: "all",
      status: "revoked",
      from: "",
      to: "",
    });
    expect(revoked.entries).toHaveLength(2);
    const inboard = await register.registerFor(admin, {
      module: "setting-inboard",
      kind: "all",
      status: "all",
      from: "",
      to: "",
    });
    expect(inboard.entries.map((entry) => entry.title)).toEqual(["Setting the inboard with the collar"]);
    const future = await register.registerFor(admin, {
      module: "",
      kind: "all",
      status: "all",
      from: `${year + 1}-01-01`,
      to: "",
    });
    expect(future.entries).toHaveLength(0);
    const csv = register.registerCsv(all);
    expect(csv.split("\r\n")[0]).toBe(
      "Serial,Kind,Athlete,Certificate,Signed off by,Issued,Expires,Status,Revocation reason,Verification address",
    );
    const bytes = await register.registerPdf(all);
    const text = pdfText(bytes);
    expect(text).toContain("Page 1 of 1");
    expect(text).toContain(`LR-${year}-0006`);
    expect(text).toContain("Signature");
  });

  it("prints a 500-row register on A4 pages with the header on each and 'Page n of m'", async () => {
    const fonts = await pdfFonts();
    const rows = Array.from({ length: 500 }, (_, index) => ({
      serial: `LR-${year}-${String(index + 1).padStart(4, "0")}`,
      athleteName: `Athlete Number ${index + 1}`,
      title: "Securing and checking before you go afloat",
      signedOffByName: "Tobias Lindqvist",
      issuedOn: today,
      expiresOn: passExpiresOn(today, 12),
      status: "Valid",
    }));
    // How long it takes is the benchmark's business (`npm run bench`: 500-row register ≤ 1 s), not a test's.
    const bytes = await renderRegisterPdf(
      { clubName: "Lantern Reach Rowing Club", filterSummary: "All modules", generatedOn: today, rows },
      fonts,
    );
    const document = await PDFDocument.load(bytes);
    const pageCount = Math.ceil(500 / registerRowsPerPage);
    expect(document.getPageCount()).toBe(pageCount);
    for (const page of document.getPages()) {
      const { width, height } = page.getSize();
      expect([Math.round(width), Math.round(height)]).toEqual([842, 595]);
    }
    const text = pdfText(bytes);
    expect(text.match(/induction register/g)).toHaveLength(pageCount);
    expect(text.match(/Signature\s/g)?.length).toBeGreaterThanOrEqual(pageCount);
    expect(text).toContain(`Page ${pageCount} of ${pageCount}`);
    expect(text).toContain("Athlete Number 500");
    expect(inkedShareOfFirstPage(bytes)).toBeGreaterThan(0.02);
  });
});

describe("upload route handlers", () => {
  let assessmentId = "";

  beforeAll(async () => {
    await passQuiz(dev, "overall-length");
    session.actor = dev;
    ({ assessmentId } = await signOffs.requestSignOff(dev, { moduleSlug: "overall-length", coachId: null }));
  });

  function context() {
    return { params: Promise.resolve({ id: assessmentId }) };
  }

  it("refuses a declared oversized upload with 413 before reading any of the body", async () => {
    session.actor = coach;
    let pulled = 0;
    const body = new ReadableStream<Uint8Array>({
      pull(controller) {
        pulled += 1;
        controller.enqueue(new Uint8Array(64 * 1024));
      },
    });
    const request = new Request("http://test/upload", {
      method: "POST",
      headers: {
        "content-type": "multipart/form-data; boundary=x",
        "content-length": String(9 * 1024 * 1024),
      },
      body,
      duplex: "half",
    } as RequestInit);
    const response = await evidenceRoute.POST(request, context());
    expect(response.status).toBe(413);
    // A ReadableStream pulls once on its own to fill its queue; the handler itself read nothing.
    expect(pulled).toBeLessThanOrEqual(1);
  });

  it("stops reading an undeclared oversized upload as soon as it passes the limit (413)", async () => {
    session.actor = coach;
    let pulled = 0;
    const chunks = 200;
    const body = new ReadableStream<Uint8Array>({
      pull(controller) {
        pulled += 1;
        if (pulled > chunks) controller.close();
        else controller.enqueue(new Uint8Array(64 * 1024));
      },
    });
    const request = new Request("http://test/upload", {
      method: "POST",
      headers: { "content-type": "multipart/form-data; boundary=x" },
      body,
      duplex: "half",
    } as RequestInit);
    const response = await evidenceRoute.POST(request, context());
    expect(response.status).toBe(413);
    expect(pulled).toBeLessThan(chunks);
    expect(pulled).toBeGreaterThanOrEqual(128);
  });

  it("refuses bytes that are not an image even with an image name and type (415)", async () => {
    session.actor = coach;
    const response = await evidenceRoute.POST(
      new Request("http://test/upload", {
        method: "POST",
        ...multipart("just some text, honestly", "photo.jpg", "image/jpeg"),
      }),
      context(),
    );
    expect(response.status).toBe(415);
    const gif = Buffer.from("R0lGODlhAQABAAAAACw=", "base64");
    expect(
      (
        await evidenceRoute.POST(
          new Request("http://test/upload", { method: "POST", ...multipart(gif, "photo.png", "image/png") }),
          context(),
        )
      ).status,
    ).toBe(415);
    // The right first bytes are not enough: a PNG signature or a JPEG start followed by anything else,
    // or a PNG cut short after its header (a PNG is decoded whole; a JPEG's header is read).
    for (const [bytes, name, type] of [
      [Buffer.concat([tinyPng.subarray(0, 8), Buffer.from("not the rest of an image at all")]), "cut.png", "image/png"],
      [tinyPng.subarray(0, 40), "cut-after-header.png", "image/png"],
      [Buffer.from([0xff, 0xd8, 0xff, 0xe0, ...Buffer.from("no frames follow this start of a JPEG")]), "cut.jpg", "image/jpeg"],
    ] as const) {
      const refused = await evidenceRoute.POST(
        new Request("http://test/upload", { method: "POST", ...multipart(bytes, name, type) }),
        context(),
      );
      expect(refused.status, name).toBe(415);
      expect(((await refused.json()) as { message: string }).message).toMatch(/damaged or cut short|must be/);
    }
  });

  it("refuses athletes and other clubs' coaches before reading", async () => {
    session.actor = dev;
    expect(
      (
        await evidenceRoute.POST(
          new Request("http://test/upload", { method: "POST", ...multipart(tinyPng, "a.png", "image/png") }),
          context(),
        )
      ).status,
    ).toBe(403);
    session.actor = foreignCoach;
    expect(
      (
        await evidenceRoute.POST(
          new Request("http://test/upload", { method: "POST", ...multipart(tinyPng, "a.png", "image/png") }),
          context(),
        )
      ).status,
    ).toBe(404);
    session.actor = null;
    expect(
      (
        await evidenceRoute.POST(
          new Request("http://test/upload", { method: "POST", ...multipart(tinyPng, "a.png", "image/png") }),
          context(),
        )
      ).status,
    ).toBe(401);
  });

  it("stores an image under a random name, serves it to the athlete and coaches, and 404s other athletes", async () => {
    session.actor = coach;
    const response = await evidenceRoute.POST(
      new Request("http://test/upload", {
        method: "POST",
        ...multipart(tinyPng, "../../../evil name.png", "text/plain"),
      }),
      context(),
    );
    expect(response.status).toBe(201);
    const { id, url } = (await response.json()) as { id: string; url: string };
    expect(url).toBe(`/api/evidence/${id}`);
    const stored = fs.readdirSync(path.join(dataDir, "uploads", "evidence"));
    expect(stored).toHaveLength(1);
    expect(stored[0]).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}\.png$/);
    expect(stored[0]).not.toContain(id);
    expect(fs.readdirSync(dataDir).some((name) => name.includes("evil"))).toBe(false);

    session.actor = dev;
    const own = await evidenceFileRoute.GET(new Request("http://test"), { params: Promise.resolve({ id }) });
    expect(own.status).toBe(200);
    expect(own.headers.get("content-type")).toBe("image/png");
    expect(own.headers.get("x-content-type-options")).toBe("nosniff");
    expect(own.headers.get("content-disposition")).toMatch(/^inline; filename="evidence-[0-9a-f-]+\.png"$/);
    expect(Buffer.from(await own.arrayBuffer()).equals(tinyPng)).toBe(true);
    session.actor = admin;
    expect((await evidenceFileRoute.GET(new Request("http://test"), { params: Promise.resolve({ id }) })).status).toBe(200);
    session.actor = carys;
    expect((await evidenceFileRoute.GET(new Request("http://test"), { params: Promise.resolve({ id }) })).status).toBe(404);
    session.actor = foreignCoach;
    expect((await evidenceFileRoute.GET(new Request("http://test"), { params: Promise.resolve({ id }) })).status).toBe(404);

    const recorded = await signOffs.recordAssessment(coach, assessmentId, {
      items: allMet("overall-length"),
      note: "",
      evidenceIds: [id],
    });
    expect(recorded.outcome).toBe("passed");
    expect((await signOffs.assessmentForCoach(coach, assessmentId)).photos.map((photo) => photo.id)).toEqual([id]);
  });

  it("accepts a PNG or JPEG club logo up to 2 MB from admins only, and puts it on certificates", async () => {
    session.actor = coach;
    expect(
      (await logoRoute.POST(new Request("http://test/logo", { method: "POST", ...multipart(tinyPng, "logo.png", "image/png") }), undefined))
        .status,
    ).toBe(403);
    session.actor = admin;
    const webp = Buffer.from("UklGRhoAAABXRUJQVlA4TA0AAAAvAAAAEAcQERGIiP4HAA==", "base64");
    expect(
      (await logoRoute.POST(new Request("http://test/logo", { method: "POST", ...multipart(webp, "logo.png", "image/png") }), undefined))
        .status,
    ).toBe(415);
    const huge = new Request("http://test/logo", {
      method: "POST",
      headers: {
        "content-type": "multipart/form-data; boundary=x",
        "content-length": String(3 * 1024 * 1024),
      },
      body: "x",
    });
    expect((await logoRoute.POST(huge, undefined)).status).toBe(413);
    expect(
      (await logoRoute.POST(new Request("http://test/logo", { method: "POST", ...multipart(tinyPng, "logo.png", "image/png") }), undefined))
        .status,
    ).toBe(201);
    const club = await Club.findByPk(admin.clubId);
    expect(club?.logoFile).toMatch(/^logo-[0-9a-f-]{36}\.png$/);
    const { readClubLogo } = await import("@/lib/data/club-logo");
    expect((await readClubLogo(admin.clubId))?.type).toBe("image/png");
    const [first] = await certificates.certificatesOfAthlete(admin, carys.id);
    const { bytes } = await certificates.certificatePdfFor(admin, first!.id);
    const file = path.join(os.tmpdir(), `slipway-logo-${Date.now()}.pdf`);
    fs.writeFileSync(file, bytes);
    // One image now (not counting the logo's alpha mask): the logo, 1 × 1 pixels. The QR code is vector.
    const images = execFileSync("pdfimages", ["-list", file], { encoding: "utf8" })
      .trim()
      .split("\n")
      .slice(2)
      .map((line) => line.trim().split(/\s+/))
      .filter((columns) => columns[2] === "image");
    expect(images.map((columns) => columns[3])).toEqual(["1"]);
  });

  it("refuses a PNG logo cut short after its header; one stored before that check is left off the PDF", async () => {
    session.actor = admin;
    // Header whole (1 × 1 pixels), image data cut: pdf-lib's PNG reader never returns on this file.
    const cut = tinyPng.subarray(0, 40);
    const refused = await logoRoute.POST(
      new Request("http://test/logo", { method: "POST", ...multipart(cut, "logo.png", "image/png") }),
      undefined,
    );
    expect(refused.status).toBe(415);
    expect(((await refused.json()) as { message: string }).message).toMatch(/damaged or cut short/);

    // As if an earlier version had stored it: the certificate still prints, without the logo.
    const { uploadsDir } = await import("@/lib/env");
    const { readClubLogo } = await import("@/lib/data/club-logo");
    const fileName = `logo-${randomUUID()}.png`;
    fs.writeFileSync(path.join(uploadsDir(), fileName), cut);
    const club = (await Club.findByPk(admin.clubId))!;
    const before = club.logoFile;
    await writeTransaction((transaction) => club.update({ logoFile: fileName }, { transaction }));
    const warn = vi.spyOn(console, "warn").mockImplementation(() => {});
    try {
      expect(await readClubLogo(admin.clubId)).toBeNull();
      const [first] = await certificates.certificatesOfAthlete(admin, carys.id);
      const { bytes } = await certificates.certificatePdfFor(admin, first!.id);
      const file = path.join(os.tmpdir(), `slipway-damaged-logo-${Date.now()}.pdf`);
      fs.writeFileSync(file, bytes);
      expect(execFileSync("pdfimages", ["-list", file], { encoding: "utf8" }).trim().split("\n").slice(2)).toEqual([]);
      expect(warn).toHaveBeenCalledWith(expect.stringContaining(`Club logo ${fileName} is a damaged PNG`));
    } finally {
      warn.mockRestore();
      await writeTransaction((transaction) => club.update({ logoFile: before }, { transaction }));
    }
  });
});

describe("club settings", () => {
  it("are saved by admins only, keep keys the form does not show, and never rewrite past certificates", async () => {
    const { clubSettingsForAdmin, updateClubSettings } = await import("@/lib/data/club-admin-settings");
    await writeTransaction(async (transaction) => {
      const club = await Club.findByPk(admin.clubId, { transaction });
      await club!.update({ settings: { ...club!.settings, raceDays: ["2027-05-01"], fleetNote: "kept" } }, { transaction });
    });
    const before = await Certificate.findAll({
      where: { clubId: admin.clubId },
      order: [["serialNumber", "ASC"]],
    });
    const { form } = await clubSettingsForAdmin(admin);
    await expect(updateClubSettings(coach, form)).rejects.toBeInstanceOf(ForbiddenError);
    await expect(updateClubSettings(admin, { ...form, clearanceModules: ["no-such-module"] })).rejects.toBeInstanceOf(ValidationError);
    const { changed } = await updateClubSettings(admin, {
      ...form,
      clearanceMonths: 6,
      passMarkPercent: 90,
      clearanceModules: ["overall-length"],
    });
    expect(changed.sort()).toEqual(["clearanceModules", "clearanceMonths", "passMark"]);
    const club = await Club.findByPk(admin.clubId);
    expect(club!.settings).toMatchObject({
      clearanceMonths: 6,
      passMark: 0.9,
      raceDays: ["2027-05-01"],
      fleetNote: "kept",
    });
    const after = await Certificate.findAll({
      where: { clubId: admin.clubId },
      order: [["serialNumber", "ASC"]],
    });
    expect(after.map((entry) => entry.expiresOn)).toEqual(before.map((entry) => entry.expiresOn));
    expect(await QuizAttempt.count({ where: { passMark: 0.9 } })).toBe(0);
    expect(await AuditEvent.count({ where: { action: "club.settings-changed" } })).toBe(1);
  });
});

describe("the club's time zone", () => {
  /** Puts the demo club in `settings` for the length of `run`, then restores what was stored. */
  async function withClubSettings(settings: Record<string, unknown>, run: () => Promise<void>): Promise<void> {
    const stored = await writeTransaction(async (transaction) => {
      const club = (await Club.findByPk(admin.clubId, { transaction }))!;
      const before = club.settings;
      await club.update({ settings: { ...before, ...settings } }, { transaction });
      return before;
    });
    try {
      await run();
    } finally {
      vi.useRealTimers();
      await writeTransaction((transaction) => Club.update({ settings: stored }, { where: { id: admin.clubId }, transaction }));
    }
  }

  /** The clock as the data functions read it (`new Date()`); timers stay real for the database. */
  function clockAt(instant: string): void {
    vi.useFakeTimers({ toFake: ["Date"] });
    vi.setSystemTime(new Date(instant));
  }

  it("dates a sign-off on the club's day, expires it from that day, and counts 'today' there", async () => {
    const elin = await actorFor("elin@lantern-reach.example");
    await withClubSettings({ timeZone: "Pacific/Auckland", clearanceMonths: 12, clearanceModules: ["overall-length"] }, async () => {
      // New Zealand keeps daylight time (UTC+13) from late September to early April (IANA Time Zone
      // Database (tzdata), IANA, 2025): 17:30 UTC on 1 March 2027 is 06:30 on 2 March at the club.
      clockAt("2027-03-01T17:30:00Z");
      await passQuiz(elin, "overall-length");
      const { assessmentId, recorded } = await signOffAll(elin, coach, "overall-length");
      expect(recorded.certificates.map((entry) => entry.kind)).toEqual(["module", "clearance"]);
      const issued = await Certificate.findAll({
        where: { athleteId: elin.id },
        order: [["serialNumber", "ASC"]],
      });
      expect(issued.map((entry) => [entry.kind, entry.issuedOn, entry.expiresOn])).toEqual([
        ["module", "2027-03-02", "2028-03-02"],
        ["clearance", "2027-03-02", "2028-03-02"],
      ]);
      expect(issued.map((entry) => entry.serialYear)).toEqual([2027, 2027]);
      const view = await signOffs.practicalViewFor(elin, "overall-length");
      expect(view.currentPass).toEqual({ signedOffOn: "2027-03-02", expiresOn: "2028-03-02" });
      expect(view.latestDecision?.assessedOn).toBe("2027-03-02");
      const detail = await signOffs.assessmentForCoach(coach, assessmentId);
      expect([detail.requestedOn, detail.assessedOn]).toEqual(["2027-03-02", "2027-03-02"]);
      expect((await quizStandingFor(elin, "overall-length")).pass?.passedOn).toBe("2027-03-02");

      const moduleCertificate = issued[0]!;
      const statusesAt = async (instant: string) => {
        clockAt(instant);
        const mine = await certificates.certificatesOfAthlete(elin, elin.id);
        const { standing, today: clubToday } = await clearance.clearanceOf(elin);
        return {
          today: clubToday,
          certificates: mine.map((entry) => entry.status),
          module: standing.modules.find((entry) => entry.slug === "overall-length")!.status,
          clearance: standing.clearance.state,
          verified: (await certificates.verifyCode(moduleCertificate.verificationCode))!.status,
        };
      };
      // 23:59 on 1 March 2028 at the club: the last day the pass counts.
      expect(await statusesAt("2028-03-01T10:59:00Z")).toEqual({
        today: "2028-03-01",
        certificates: ["valid", "valid"],
        module: "passed",
        clearance: "cleared",
        verified: "valid",
      });
      // Midnight at the club, still 1 March in UTC: the pass has expired there.
      expect(await statusesAt("2028-03-01T11:00:00Z")).toEqual({
        today: "2028-03-02",
        certificates: ["expired", "expired"],
        module: "expired",
        clearance: "expired",
        verified: "expired",
      });

      // The roster, the public credential, the certificate PDF and the register go by the same day.
      const matrix = await clearance.rosterMatrix(coach);
      expect(matrix.today).toBe("2028-03-02");
      expect(matrix.athletes.find((row) => row.id === elin.id)?.clearance.state).toBe("expired");
      const badge = (await (
        await verifyRoute.GET(new Request("http://test"), {
          params: Promise.resolve({ code: moduleCertificate.verificationCode }),
        })
      ).json()) as { description: string };
      expect(badge.description).toMatch(/: expired\.$/);
      session.actor = elin;
      const pdf = await pdfRoute.GET(new Request("http://test"), {
        params: Promise.resolve({ id: moduleCertificate.id }),
      });
      expect(pdfText(new Uint8Array(await pdf.arrayBuffer()))).toContain("Expired on 2 March 2028: no longer valid.");
      const listed = await register.registerFor(admin, {
        module: "",
        kind: "all",
        status: "expired",
        from: "2027-03-02",
        to: "2027-03-02",
      });
      expect(listed.generatedOn).toBe("2028-03-02");
      expect(listed.entries.map((entry) => entry.serial)).toEqual(issued.map((entry) => entry.serial));
      session.actor = admin;
      const csv = await registerCsvRoute.GET(new Request("http://test/api/register/csv"), undefined);
      expect(csv.headers.get("content-disposition")).toContain("induction-register-2028-03-02.csv");
      const printed = await registerPdfRoute.GET(new Request("http://test/api/register/pdf"), undefined);
      expect(printed.headers.get("content-disposition")).toContain("induction-register-2028-03-02.pdf");
      expect(pdfText(new Uint8Array(await printed.arrayBuffer()))).toContain("Printed 2028-03-02");
    });
  });
});
