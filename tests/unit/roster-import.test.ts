import { describe, expect, it } from "vitest";
import { checkRoster, decodeRosterText, rosterFileProblem, rosterLimits, rosterProblemFields } from "@/lib/members/roster-import";

describe("checkRoster", () => {
  it("reads good rows, lower-cases e-mail and defaults the role to athlete", () => {
    const result = checkRoster("name,email,role\nWren Halloway,Wren@Example.org,coach\nOtto Fairlie,otto@example.org,\n");
    expect(result.fileProblem).toBeNull();
    expect(result.rowCount).toBe(2);
    expect(result.problems).toEqual([]);
    expect(result.entries).toEqual([
      { row: 2, name: "Wren Halloway", email: "wren@example.org", role: "coach" },
      { row: 3, name: "Otto Fairlie", email: "otto@example.org", role: "athlete" },
    ]);
  });

  it("works without a role column, with a BOM, CRLF, semicolons and header spelling variants", () => {
    const result = checkRoster("\uFEFFName;E-mail\r\nMina Strand;mina@example.org\r\n\r\n");
    expect(result.fileProblem).toBeNull();
    expect(result.entries).toEqual([{ row: 2, name: "Mina Strand", email: "mina@example.org", role: "athlete" }]);
  });

  it("accepts role words case-insensitively, including the role labels", () => {
    const result = checkRoster("name,email,role\nA,a@example.org,ATHLETE\nB,b@example.org,Club administrator\nC,c@example.org, Coach ");
    expect(result.entries.map((entry) => entry.role)).toEqual(["athlete", "admin", "coach"]);
  });

  it("reports each problem with its row number (header is row 1) and field", () => {
    const csv = [
      "name,email,role",
      "Good One,good@example.org,athlete", // 2
      ",noname@example.org,athlete", // 3 missing name
      "Bad Mail,not-an-address,athlete", // 4 bad e-mail
      "Odd Role,odd@example.org,captain", // 5 unknown role
      "Again,GOOD@example.org,coach", // 6 duplicate of row 2
      "Member,ada@lantern.example,athlete", // 7 already a member
      "Pending,pending@example.org,athlete", // 8 open invitation
      "No Mail,,athlete", // 9 missing e-mail
    ].join("\n");
    const result = checkRoster(csv, {
      existingEmails: new Set(["ada@lantern.example"]),
      pendingEmails: new Set(["pending@example.org"]),
    });
    expect(result.entries.map((entry) => entry.row)).toEqual([2]);
    expect(result.problems.map(({ row, field }) => [row, field])).toEqual([
      [3, "name"],
      [4, "email"],
      [5, "role"],
      [6, "email"],
      [7, "email"],
      [8, "email"],
      [9, "email"],
    ]);
    const byRow = new Map(result.problems.map((problem) => [problem.row, problem.message]));
    expect(byRow.get(3)).toBe("Missing name.");
    expect(byRow.get(4)).toContain("not an e-mail address");
    expect(byRow.get(5)).toContain('Unknown role "captain"');
    expect(byRow.get(6)).toContain("row 2");
    expect(byRow.get(7)).toContain("Already a member");
    expect(byRow.get(8)).toContain("Already invited");
    expect(byRow.get(9)).toBe("Missing e-mail address.");
  });

  it("lists every problem of a row, not only the first", () => {
    const result = checkRoster("name,email,role\n,broken,boss\n");
    expect(result.problems.map((problem) => problem.field)).toEqual(["name", "email", "role"]);
    expect(result.entries).toEqual([]);
  });

  it("refuses a file without the name or email column, or without rows", () => {
    expect(checkRoster("first,last\nA,B\n").fileProblem).toContain("Missing: name, email");
    expect(checkRoster("name,mail\nA,a@example.org\n").fileProblem).toContain("Missing: email");
    expect(checkRoster("name,email\n").fileProblem).toContain("no member rows");
    expect(checkRoster("").fileProblem).not.toBeNull();
  });

  it("refuses more than the row limit as a whole", () => {
    const rows = Array.from({ length: rosterLimits.maxRows + 1 }, (_, index) => `P${index},p${index}@example.org`);
    const result = checkRoster(["name,email", ...rows].join("\n"));
    expect(result.fileProblem).toContain(`${rosterLimits.maxRows + 1} member rows`);
    expect(result.entries).toEqual([]);
    const atLimit = checkRoster(["name,email", ...rows.slice(0, rosterLimits.maxRows)].join("\n"));
    expect(atLimit.fileProblem).toBeNull();
    expect(atLimit.entries).toHaveLength(rosterLimits.maxRows);
  });

  it("refuses text larger than the byte limit", () => {
    const big = `name,email\n${"x".repeat(rosterLimits.maxBytes)},a@example.org\n`;
    expect(checkRoster(big).fileProblem).toContain("larger than 200 KB");
  });

  it("keeps quoted commas in names and flags an unclosed quote", () => {
    expect(checkRoster('name,email\n"Strand, Mina",mina@example.org\n').entries[0]?.name).toBe("Strand, Mina");
    const broken = checkRoster('name,email\n"Unclosed,u@example.org\n');
    expect(broken.problems.some((problem) => problem.field === "row")).toBe(true);
    expect(broken.entries).toEqual([]);
    const later = checkRoster('name,email\nOk,ok@example.org\n"Unclosed,u@example.org\nz,z@example.org\n');
    expect(later.entries.map((entry) => entry.row)).toEqual([2]);
    expect(later.problems.find((problem) => problem.field === "row")?.row).toBe(3);
  });

  it("rejects names that are too long", () => {
    const result = checkRoster(`name,email\n${"N".repeat(121)},long@example.org\n`);
    expect(result.problems).toEqual([{ row: 2, field: "name", message: "Name longer than 120 characters." }]);
  });
});

describe("rosterProblemFields", () => {
  it("names each problem by row and column, the whole row by its number, as the import route and action answer", () => {
    expect(
      rosterProblemFields([
        { row: 2, field: "email", message: "Missing e-mail address." },
        { row: 2, field: "email", message: "Second." },
        { row: 3, field: "row", message: "A quotation mark is not closed." },
      ]),
    ).toEqual({ "rows.2.email": ["Missing e-mail address.", "Second."], "rows.3": ["A quotation mark is not closed."] });
  });
});

describe("rosterFileProblem and decodeRosterText", () => {
  it("accepts CSV and plain text within the size limit", () => {
    expect(rosterFileProblem({ size: 100, type: "text/csv" })).toBeNull();
    expect(rosterFileProblem({ size: 100, type: "text/plain; charset=utf-8" })).toBeNull();
    expect(rosterFileProblem({ size: 100, type: "application/vnd.ms-excel" })).toBeNull();
    expect(rosterFileProblem({ size: 100, type: "" })).toBeNull();
  });

  it("refuses empty, oversized and non-text files", () => {
    expect(rosterFileProblem({ size: 0, type: "text/csv" })).toContain("empty");
    expect(rosterFileProblem({ size: rosterLimits.maxBytes + 1, type: "text/csv" })).toContain("200 KB");
    expect(rosterFileProblem({ size: 100, type: "image/png" })).toContain("CSV");
    expect(rosterFileProblem({ size: 100, type: "application/pdf" })).toContain("CSV");
  });

  it("decodes UTF-8 and refuses binary bytes", () => {
    expect(decodeRosterText(new TextEncoder().encode("name,email\nInès,i@example.org"))).toContain("Inès");
    expect(decodeRosterText(new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0xff, 0xfe]))).toBeNull();
    expect(decodeRosterText(new Uint8Array([0x61, 0x00, 0x62]))).toBeNull();
  });
});
